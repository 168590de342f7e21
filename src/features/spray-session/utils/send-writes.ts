import { createCoat } from '../../../api/coats/create-coat';
import { createDenib } from '../../../api/denibs/create-denib';
import { createMix } from '../../../api/mixes/create-mix';
import { updateSpraySession } from '../../../api/spray-sessions/update-spray-session';
import { isApiError } from '../../../lib/api-client';
import { errorMessage } from '../../../lib/error-messages';
import { markRefused, queuedWrites, removeQueued, settleMix, type PendingKind, type PendingWrite } from './write-queue';

/** Answers that say "not now" rather than "not this write": it waits and is sent again later. */
const tryLater = new Set([
  'network',
  'unauthenticated',
  'csrf_invalid',
  'too_many_requests',
  'internal',
  'bad_response',
]);

/** Stand-in pot ids this pass has swapped for the server's (the queue is read once, before the pot was sent). */
type MixIds = Map<number, number>;

/** One write to the server; the idempotency key makes a repeat (an answer lost on the way back) return the first answer. */
async function send(write: PendingWrite, mixIds: MixIds): Promise<void> {
  const key = write.body.idempotencyKey;
  switch (write.kind) {
    case 'coat': {
      const mixId = write.body.mixId === null ? null : (mixIds.get(write.body.mixId) ?? write.body.mixId);
      await createCoat({ ...write.body, mixId });
      return removeQueued(key);
    }
    case 'mix': {
      const mix = await createMix({ spraySessionId: write.spraySessionId, input: write.body });
      mixIds.set(write.localId, mix.id);
      return settleMix(key, write.localId, mix.id);
    }
    case 'denib':
      await createDenib(write.body);
      return removeQueued(key);
    case 'session':
      await updateSpraySession({ id: write.spraySessionId, changes: write.body });
      return removeQueued(key);
  }
}

export type SentKinds = Set<PendingKind>;

/**
 * Sends the waiting writes in the order they were made. A write the server refuses is kept with its
 * message for a person to look at, and the later writes of its session wait behind it (the start needs
 * the checks, a coat may name a pot not yet sent); other sessions' writes go on.
 */
async function sendEach(): Promise<SentKinds> {
  const sent: SentKinds = new Set();
  const held = new Set<number>();
  const mixIds: MixIds = new Map();
  for (const write of await queuedWrites()) {
    if (write.problem !== null || held.has(write.spraySessionId)) {
      held.add(write.spraySessionId);
      continue;
    }
    try {
      await send(write, mixIds);
      sent.add(write.kind);
    } catch (error) {
      if (isApiError(error) && tryLater.has(error.code)) break;
      await markRefused(write.body.idempotencyKey, errorMessage(error));
      held.add(write.spraySessionId);
    }
  }
  return sent;
}

let sending: Promise<SentKinds> | null = null;

/** One pass at a time for the whole tab: two passes at once would send the same write twice. */
export function sendQueued(): Promise<SentKinds> {
  sending ??= sendEach().finally(() => {
    sending = null;
  });
  return sending;
}

/** The writes of a session that wait behind one the server refused. */
export function heldBehindRefusal(writes: PendingWrite[]): Set<string> {
  const held = new Set<string>();
  const refused = new Set<number>();
  for (const write of writes) {
    if (refused.has(write.spraySessionId)) held.add(write.body.idempotencyKey);
    if (write.problem !== null) refused.add(write.spraySessionId);
  }
  return held;
}

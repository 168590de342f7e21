import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useState } from 'react';
import { toast } from 'sonner';
import { changedKeys } from '../../../api/changes';
import { createCoat } from '../../../api/coats/create-coat';
import { invalidate } from '../../../api/invalidate';
import { isApiError } from '../../../lib/api-client';
import { errorMessage } from '../../../lib/error-messages';
import {
  markRefused,
  onQueueChange,
  queueCoat,
  queuedCoats,
  removeQueued,
  type PendingCoat,
} from '../utils/coat-queue';

export type { PendingCoat } from '../utils/coat-queue';
export type QueueCoat = (body: PendingCoat['body'], label: string) => Promise<void>;

/** Answers that say "not now" rather than "not this coat": the coat waits and is sent again later. */
const tryLater = new Set([
  'network',
  'unauthenticated',
  'csrf_invalid',
  'too_many_requests',
  'internal',
  'bad_response',
]);

let sending: Promise<number> | null = null;

async function sendEach(): Promise<number> {
  let sent = 0;
  for (const coat of (await queuedCoats()).filter((c) => c.problem === null)) {
    try {
      // The idempotency key makes a repeat (an answer lost on the way back) return the first record.
      await createCoat(coat.body);
      await removeQueued(coat.body.idempotencyKey);
      sent += 1;
    } catch (error) {
      if (isApiError(error) && tryLater.has(error.code)) break;
      await markRefused(coat.body.idempotencyKey, errorMessage(error));
    }
  }
  return sent;
}

/** Sends the waiting coats in the order they were recorded, one pass at a time for the whole tab. */
function sendQueued(): Promise<number> {
  sending ??= sendEach().finally(() => {
    sending = null;
  });
  return sending;
}

/** The coats waiting on this tablet, kept current as they are queued, sent or refused. */
function useQueuedCoats(): PendingCoat[] {
  const [coats, setCoats] = useState<PendingCoat[]>([]);
  useEffect(() => {
    let live = true;
    const load = () =>
      void queuedCoats()
        .then((next) => live && setCoats(next))
        .catch(() => undefined);
    load();
    const stop = onQueueChange(load);
    return () => {
      live = false;
      stop();
    };
  }, []);
  return coats;
}

function useResend() {
  const queryClient = useQueryClient();
  return useCallback(async () => {
    const sent = await sendQueued().catch(() => 0);
    if (sent === 0) return;
    toast.success(
      sent === 1 ? 'The waiting coat is now on the server.' : `${sent} waiting coats are now on the server.`,
    );
    await invalidate(queryClient, changedKeys.coat());
  }, [queryClient]);
}

const resendEveryMs = 15_000;

/**
 * Sends the tablet's waiting coats when the browser comes back online, at start and every 15 s
 * while any wait, from whatever page is open. Mounted once, in the signed-in layout.
 */
export function useCoatQueueSender(): void {
  const waiting = useQueuedCoats().some((coat) => coat.problem === null);
  const resend = useResend();
  useEffect(() => {
    if (!waiting) return;
    const onOnline = () => void resend();
    if (navigator.onLine) onOnline();
    window.addEventListener('online', onOnline);
    const timer = window.setInterval(onOnline, resendEveryMs);
    return () => {
      window.removeEventListener('online', onOnline);
      window.clearInterval(timer);
    };
  }, [waiting, resend]);
}

/**
 * Coats recorded while the booth had no connection, kept in this tablet's IndexedDB (so they
 * outlive a closed browser or a restart) with their idempotency key until the server has them.
 */
export function usePendingCoats(sessionId: number) {
  const pending = useQueuedCoats().filter((coat) => coat.body.spraySessionId === sessionId);
  const resend = useResend();
  const add: QueueCoat = useCallback(
    (body, label) => queueCoat({ body, label, queuedAt: new Date().toISOString(), problem: null }),
    [],
  );
  const discard = useCallback((key: string) => void removeQueued(key), []);
  return { pending, add, discard, resend };
}

import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useState } from 'react';
import { toast } from 'sonner';
import { changedKeys } from '../../../api/changes';
import { invalidate } from '../../../api/invalidate';
import { sendQueued, type SentKinds } from '../utils/send-writes';
import {
  onQueueChange,
  queuedWrites,
  queueWrite,
  removeQueued,
  type NewWrite,
  type PendingWrite,
} from '../utils/write-queue';

export type { PendingWrite } from '../utils/write-queue';
/** Keeps one write on the tablet; what the caller passes is all but the bookkeeping. */
export type QueueWrite = (write: NewWrite) => Promise<void>;

/** The writes waiting on this tablet, kept current as they are queued, sent or refused. */
function useQueuedWrites(): PendingWrite[] {
  const [writes, setWrites] = useState<PendingWrite[]>([]);
  useEffect(() => {
    let live = true;
    const load = () =>
      void queuedWrites()
        .then((next) => live && setWrites(next))
        .catch(() => undefined);
    load();
    const stop = onQueueChange(load);
    return () => {
      live = false;
      stop();
    };
  }, []);
  return writes;
}

const changedBy = {
  coat: changedKeys.coat,
  mix: changedKeys.mix,
  denib: changedKeys.denib,
  session: changedKeys.spraySession,
};

function sentWords(sent: SentKinds): string {
  return sent.size === 1 && sent.has('coat')
    ? 'The coats kept on this tablet are now on the server.'
    : 'What was kept on this tablet is now on the server.';
}

function useResend() {
  const queryClient = useQueryClient();
  return useCallback(async () => {
    const sent = await sendQueued().catch((): SentKinds => new Set());
    if (sent.size === 0) return;
    toast.success(sentWords(sent));
    await invalidate(
      queryClient,
      [...sent].flatMap((kind) => changedBy[kind]()),
    );
  }, [queryClient]);
}

const resendEveryMs = 15_000;

/**
 * Sends the tablet's waiting writes when the browser comes back online, at start and every 15 s
 * while any wait, from whatever page is open. Mounted once, in the signed-in layout.
 */
export function useWriteQueueSender(): void {
  const waiting = useQueuedWrites().some((write) => write.problem === null);
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
 * A session's writes made while the booth had no connection, kept in this tablet's IndexedDB (so
 * they outlive a closed browser or a restart) with their idempotency keys until the server has them.
 */
export function usePendingWrites(sessionId: number) {
  const pending = useQueuedWrites().filter((write) => write.spraySessionId === sessionId);
  const resend = useResend();
  const add: QueueWrite = useCallback(
    (write) => queueWrite({ ...write, queuedAt: new Date().toISOString(), problem: null }),
    [],
  );
  const discard = useCallback((key: string) => void removeQueued(key), []);
  return { pending, add, discard, resend };
}

export type PendingWrites = ReturnType<typeof usePendingWrites>;

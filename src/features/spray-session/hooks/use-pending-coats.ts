import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';
import { toast } from 'sonner';
import { z } from 'zod';
import { changedKeys } from '../../../api/changes';
import { createCoat } from '../../../api/coats/create-coat';
import { invalidate } from '../../../api/invalidate';
import { createCoatSchema } from '../../../../shared/schemas/coat';
import { isApiError } from '../../../lib/api-client';
import { errorMessage } from '../../../lib/error-messages';

const pendingCoatSchema = z.object({
  body: createCoatSchema.extend({ idempotencyKey: z.string().min(8) }),
  label: z.string(),
  queuedAt: z.string(),
  /** Set when the server answered but refused the coat: resending cannot help, a person must look. */
  problem: z.string().nullable(),
});
export type PendingCoat = z.infer<typeof pendingCoatSchema>;

const storageKey = (sessionId: number) => `boothwright:pending-coats:session-${sessionId}`;
const resendEveryMs = 15_000;

function readStored(sessionId: number): PendingCoat[] {
  try {
    const parsed = z.array(pendingCoatSchema).safeParse(JSON.parse(localStorage.getItem(storageKey(sessionId)) ?? '[]'));
    return parsed.success ? parsed.data : [];
  } catch {
    return [];
  }
}

function writeStored(sessionId: number, coats: PendingCoat[]): void {
  if (coats.length === 0) localStorage.removeItem(storageKey(sessionId));
  else localStorage.setItem(storageKey(sessionId), JSON.stringify(coats));
}

/**
 * Coats recorded while the booth had no connection. They live in this tablet's storage with their
 * idempotency key and are resent when the browser comes back online and every 15 s; the key makes
 * the server answer a repeat with the first record, so a resend never makes a second coat.
 */
export function usePendingCoats(sessionId: number) {
  const queryClient = useQueryClient();
  const [pending, setPending] = useState(() => readStored(sessionId));
  const sending = useRef(false);

  const change = useCallback(
    (edit: (coats: PendingCoat[]) => PendingCoat[]) => {
      const next = edit(readStored(sessionId));
      writeStored(sessionId, next);
      setPending(next);
    },
    [sessionId],
  );

  const sendOne = useCallback(
    async (coat: PendingCoat): Promise<'sent' | 'offline' | 'refused'> => {
      try {
        await createCoat(coat.body);
        change((coats) => coats.filter((c) => c.body.idempotencyKey !== coat.body.idempotencyKey));
        return 'sent';
      } catch (error) {
        if (isApiError(error) && error.code === 'network') return 'offline';
        change((coats) => coats.map((c) => (c.body.idempotencyKey === coat.body.idempotencyKey ? { ...c, problem: errorMessage(error) } : c)));
        return 'refused';
      }
    },
    [change],
  );

  const resend = useCallback(async () => {
    if (sending.current) return;
    sending.current = true;
    let sent = 0;
    try {
      for (const coat of readStored(sessionId).filter((c) => c.problem === null)) {
        const outcome = await sendOne(coat);
        if (outcome === 'offline') break;
        if (outcome === 'sent') sent += 1;
      }
    } finally {
      sending.current = false;
    }
    if (sent > 0) {
      toast.success(sent === 1 ? 'The pending coat is now on the server.' : `${sent} pending coats are now on the server.`);
      await invalidate(queryClient, changedKeys.coat());
    }
  }, [queryClient, sendOne, sessionId]);

  const waiting = pending.some((c) => c.problem === null);
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

  const add = useCallback((body: PendingCoat['body'], label: string) => change((coats) => [...coats, { body, label, queuedAt: new Date().toISOString(), problem: null }]), [change]);
  const discard = useCallback((key: string) => change((coats) => coats.filter((c) => c.body.idempotencyKey !== key)), [change]);

  return { pending, add, discard, resend };
}

import { isApiError } from '../../../lib/api-client';
import { usePendingWrites, type QueueWrite } from './use-pending-writes';

export type SendOutcome<T> = { kind: 'saved'; value: T } | { kind: 'queued' };

/**
 * Sends a booth write now, or keeps it on the tablet: when the browser has no connection, when the
 * send fails for want of one, and while earlier writes of the session still wait (so the server gets
 * them in the order they were made). The write carries its idempotency key both ways, so an answer
 * lost on the way back and the later resend make one record. A refusal is thrown for the form to show;
 * so is a failure to keep the write on the tablet, never a silent loss.
 */
export function useSendOrKeep(sessionId: number) {
  const { pending, add, resend } = usePendingWrites(sessionId);
  const behind = pending.length > 0;
  return async <T>(write: Parameters<QueueWrite>[0], online: () => Promise<T>): Promise<SendOutcome<T>> => {
    if (!navigator.onLine || behind) {
      await add(write);
      if (navigator.onLine) void resend();
      return { kind: 'queued' };
    }
    try {
      return { kind: 'saved', value: await online() };
    } catch (error) {
      if (!isApiError(error) || error.code !== 'network') throw error;
      await add(write);
      return { kind: 'queued' };
    }
  };
}

import type { Coat, CreateCoatInput } from '../../../../shared/schemas/coat';
import { isApiError } from '../../../lib/api-client';
import { useCreateCoat } from '../../../api/coats/create-coat';
import type { PendingCoat } from './use-pending-coats';

type RecordOutcome = { kind: 'saved'; coat: Coat } | { kind: 'queued' } | { kind: 'failed'; error: unknown };

/**
 * Sends a coat; when the booth has no connection the coat is queued on the tablet with the same
 * idempotency key, so the resend and any answer that was lost on the way make one record.
 */
export function useRecordCoat(queue: (body: PendingCoat['body'], label: string) => void) {
  const createCoat = useCreateCoat();
  const record = async (body: Required<Omit<CreateCoatInput, 'idempotencyKey'>> & { idempotencyKey: string }, label: string): Promise<RecordOutcome> => {
    // The browser already knows there is no connection: keep the coat here rather than wait for a send to fail.
    if (!navigator.onLine) {
      queue(body, label);
      return { kind: 'queued' };
    }
    try {
      const { coat } = await createCoat.mutateAsync(body);
      return { kind: 'saved', coat };
    } catch (error) {
      if (isApiError(error) && error.code === 'network') {
        queue(body, label);
        return { kind: 'queued' };
      }
      return { kind: 'failed', error };
    }
  };
  return { record, pending: createCoat.isPending };
}

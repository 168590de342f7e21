import type { Coat, CreateCoatInput } from '../../../../shared/schemas/coat';
import { isApiError } from '../../../lib/api-client';
import { useCreateCoat } from '../../../api/coats/create-coat';
import type { QueueCoat } from './use-pending-coats';

type RecordOutcome = { kind: 'saved'; coat: Coat } | { kind: 'queued' } | { kind: 'failed'; error: unknown };

/**
 * Sends a coat; when the booth has no connection the coat is queued on the tablet with the same
 * idempotency key, so the resend and any answer that was lost on the way make one record.
 */
export function useRecordCoat(queue: QueueCoat) {
  const createCoat = useCreateCoat();
  // A coat the tablet could not keep either (storage refused) is a failure the sprayer must see, never a silent loss.
  const keep = async (body: Parameters<QueueCoat>[0], label: string): Promise<RecordOutcome> => {
    try {
      await queue(body, label);
      return { kind: 'queued' };
    } catch (error) {
      return { kind: 'failed', error };
    }
  };
  const record = async (body: Required<Omit<CreateCoatInput, 'idempotencyKey'>> & { idempotencyKey: string }, label: string): Promise<RecordOutcome> => {
    // The browser already knows there is no connection: keep the coat here rather than wait for a send to fail.
    if (!navigator.onLine) return keep(body, label);
    try {
      const { coat } = await createCoat.mutateAsync(body);
      return { kind: 'saved', coat };
    } catch (error) {
      if (isApiError(error) && error.code === 'network') return keep(body, label);
      return { kind: 'failed', error };
    }
  };
  return { record, pending: createCoat.isPending };
}

import type { Coat, CreateCoatInput } from '../../../../shared/schemas/coat';
import { useCreateCoat } from '../../../api/coats/create-coat';
import { useSendOrKeep } from './use-send-or-keep';

type RecordOutcome = { kind: 'saved'; coat: Coat } | { kind: 'queued' } | { kind: 'failed'; error: unknown };
type CoatBody = Required<Omit<CreateCoatInput, 'idempotencyKey'>> & { idempotencyKey: string };

/**
 * Sends a coat; when the booth has no connection the coat is queued on the tablet with the same
 * idempotency key, so the resend and any answer that was lost on the way make one record.
 */
export function useRecordCoat(sessionId: number) {
  const createCoat = useCreateCoat();
  const sendOrKeep = useSendOrKeep(sessionId);
  const record = async (body: CoatBody, label: string): Promise<RecordOutcome> => {
    try {
      const outcome = await sendOrKeep({ kind: 'coat', spraySessionId: sessionId, body, label }, () => createCoat.mutateAsync(body));
      return outcome.kind === 'saved' ? { kind: 'saved', coat: outcome.value.coat } : outcome;
    } catch (error) {
      // A refusal, or a coat the tablet could not keep either (storage refused): the sprayer must see it, never a silent loss.
      return { kind: 'failed', error };
    }
  };
  return { record, pending: createCoat.isPending };
}

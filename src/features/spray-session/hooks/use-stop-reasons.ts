import { useState } from 'react';
import type { CoatWarning } from '../../../../shared/finishing/coat-record';
import { acknowledgementSchema } from '../../../../shared/schemas/coat';

type Acknowledgement = { code: string; reason: string };

/**
 * The sprayer's one reason for going ahead despite every stop on the coat, checked with the
 * schema the server uses and sent with each stop's code: one answer, not a form per warning.
 */
export function useStopReasons(warnings: CoatWarning[]) {
  const [reason, setReason] = useState('');
  const [error, setError] = useState<string | null>(null);
  const stops = warnings.filter((w) => w.verdict === 'stop');

  /** The acknowledgements to send, or null (with the error shown) while a stop has no good reason. */
  const check = (): Acknowledgement[] | null => {
    if (stops.length === 0) {
      setError(null);
      return [];
    }
    const result = acknowledgementSchema.shape.reason.safeParse(reason);
    setError(result.success ? null : result.error.issues[0].message);
    return result.success ? stops.map((w) => ({ code: w.code, reason: result.data })) : null;
  };

  const clear = () => {
    setReason('');
    setError(null);
  };
  // Typing answers the message; it is checked again on the next record.
  const change = (next: string) => {
    setReason(next);
    setError(null);
  };
  return { reason, error, setReason: change, check, clear, stopCount: stops.length };
}

import { useState } from 'react';
import type { CoatWarning } from '../../../../shared/finishing/coat-record';
import { acknowledgementSchema } from '../../../../shared/schemas/coat';

type Acknowledgement = { code: string; reason: string };

/** The sprayer's reason for each stop on a coat; checked with the same schema the server uses. */
export function useStopReasons(warnings: CoatWarning[]) {
  const [reasons, setReasons] = useState<Record<string, string>>({});
  const [errors, setErrors] = useState<Record<string, string>>({});

  /** The acknowledgements to send, or null (with the errors shown) while a stop has no good reason. */
  const check = (): Acknowledgement[] | null => {
    const results = warnings.filter((w) => w.verdict === 'stop').map((w) => ({ code: w.code, result: acknowledgementSchema.safeParse({ code: w.code, reason: reasons[w.code] ?? '' }) }));
    setErrors(Object.fromEntries(results.flatMap(({ code, result }) => (result.success ? [] : [[code, result.error.issues[0].message]]))));
    const acknowledged = results.flatMap(({ result }) => (result.success ? [result.data] : []));
    return acknowledged.length === results.length ? acknowledged : null;
  };

  const setReason = (code: string, reason: string) => setReasons((current) => ({ ...current, [code]: reason }));
  const clear = () => {
    setReasons({});
    setErrors({});
  };
  return { reasons, errors, setReason, check, clear };
}

import { AppError } from '../lib/app-error';

export interface Once<T> {
  result: T;
  /** The key had already made this answer: nothing new was recorded. */
  replayed: boolean;
}

/**
 * A write sent with an idempotency key happens once: a repeat (a tablet resending after a lost
 * answer, however long it was offline) gets the first answer. `earlier` finds that answer by the key;
 * when two copies race, the database's unique key lets one in and the other reads the winner's answer.
 */
export async function writeOnce<T>(
  key: string | null | undefined,
  earlier: (key: string) => Promise<T | null>,
  write: () => Promise<T>,
): Promise<Once<T>> {
  const first = key ? await earlier(key) : null;
  if (first) return { result: first, replayed: true };
  try {
    return { result: await write(), replayed: false };
  } catch (error) {
    const raced = key ? await earlier(key) : null;
    if (raced) return { result: raced, replayed: true };
    throw error;
  }
}

/** A key already used for a record the caller may not see (another site's) is not answered with it. */
export function keyOfAnotherRecord(): AppError {
  return new AppError('conflict', 'This idempotency key belongs to another record', {
    idempotencyKey: 'Send a new key',
  });
}

// @vitest-environment jsdom
import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { createCoatSchema } from '../../../../shared/schemas/coat';
import { openDB } from 'idb';
import {
  markRefused,
  onQueueChange,
  queuedWrites,
  queueWrite,
  removeQueued,
  type PendingWrite,
} from '../../../../src/features/spray-session/utils/write-queue';

type Coat = Extract<PendingWrite, { kind: 'coat' }>;
const queuedCoats = queuedWrites;
const queueCoat = queueWrite;

const coat = (key: string, sessionId: number, queuedAt: string): Coat => ({
  kind: 'coat',
  spraySessionId: sessionId,
  body: createCoatSchema.parse({
    spraySessionId: sessionId,
    partIds: [1],
    productId: 1,
    sprayedAt: queuedAt,
    airTempC: 20,
    relativeHumidityPct: 50,
    surfaceTempC: 19,
    idempotencyKey: key,
  }) as Coat['body'],
  label: `coat ${key}`,
  queuedAt,
  problem: null,
});

// Left by the earlier version of the app, which kept one list per spray session in localStorage.
localStorage.setItem(
  'boothwright:pending-coats:session-7',
  JSON.stringify([coat('legacy-key-2', 7, '2027-03-01T10:05:00Z')]),
);
localStorage.setItem(
  'boothwright:pending-coats:session-6',
  JSON.stringify([coat('legacy-key-1', 6, '2027-03-01T10:00:00Z')]),
);
localStorage.setItem('boothwright:pending-coats:session-8', 'not json');

describe('the write queue on the tablet', () => {
  it('takes coats left in localStorage once, in the order they were recorded, and clears them there', async () => {
    expect((await queuedCoats()).map((c) => c.body.idempotencyKey)).toEqual(['legacy-key-1', 'legacy-key-2']);
    // What could not be read stays where it was rather than being thrown away.
    expect(Object.keys(localStorage).filter((key) => key.startsWith('boothwright:pending-coats:'))).toEqual([
      'boothwright:pending-coats:session-8',
    ]);
    expect(await queuedCoats()).toHaveLength(2);
  });

  it('keeps new coats after the old ones, tells listeners, and marks or removes one by its key', async () => {
    let told = 0;
    const stop = onQueueChange(() => (told += 1));
    await queueCoat(coat('new-key-0003', 7, '2027-03-01T10:10:00Z'));
    await markRefused('legacy-key-2', 'The session is cancelled');
    await removeQueued('legacy-key-1');
    stop();
    const left = await queuedCoats();
    expect(left.map((c) => [c.body.idempotencyKey, c.problem])).toEqual([
      ['legacy-key-2', 'The session is cancelled'],
      ['new-key-0003', null],
    ]);
    expect(told).toBe(3);
  });

  it('refuses a second coat with the same idempotency key rather than keeping it twice', async () => {
    await expect(queueCoat(coat('new-key-0003', 7, '2027-03-01T10:12:00Z'))).rejects.toThrow();
    expect(await queuedCoats()).toHaveLength(2);
  });

  it('reads a coat an earlier version kept in the store (no kind, no session of its own) as a coat of its session', async () => {
    const { kind: _kind, spraySessionId: _session, ...old } = coat('stored-key-4', 9, '2027-03-01T10:15:00Z');
    const db = await openDB('boothwright', 1);
    await db.add('pending-coats', old);
    db.close();
    const read = (await queuedWrites()).find((write) => write.body.idempotencyKey === 'stored-key-4');
    expect(read).toMatchObject({ kind: 'coat', spraySessionId: 9, problem: null });
  });
});

// @vitest-environment jsdom
import 'fake-indexeddb/auto';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../../../src/lib/api-client';
import { heldBehindRefusal, sendQueued } from '../../../../src/features/spray-session/utils/send-writes';
import {
  queuedWrites,
  queueWrite,
  removeQueued,
  type PendingWrite,
} from '../../../../src/features/spray-session/utils/write-queue';

const sent: string[] = [];
const refuse = new Map<string, ApiError>();
const answer = (key: string, value: unknown) => {
  const refusal = refuse.get(key);
  if (refusal) return Promise.reject(refusal);
  sent.push(key);
  return Promise.resolve(value);
};
type Keyed = { idempotencyKey: string };
vi.mock('../../../../src/api/coats/create-coat', () => ({
  createCoat: (body: Keyed & { mixId: number | null }) => answer(`${body.idempotencyKey}:mix=${body.mixId}`, {}),
}));
vi.mock('../../../../src/api/mixes/create-mix', () => ({
  createMix: ({ input }: { input: Keyed }) => answer(input.idempotencyKey, { id: 41 }),
}));
vi.mock('../../../../src/api/denibs/create-denib', () => ({
  createDenib: (body: Keyed) => answer(body.idempotencyKey, {}),
}));
vi.mock('../../../../src/api/spray-sessions/update-spray-session', () => ({
  updateSpraySession: ({ changes }: { changes: Keyed }) => answer(changes.idempotencyKey, {}),
}));

const at = '2027-03-01T10:00:00Z';
const base = { label: 'x', queuedAt: at, problem: null };
const start = (key: string, spraySessionId: number): PendingWrite => ({
  ...base,
  kind: 'session',
  spraySessionId,
  body: { state: 'spraying', changedAt: at, idempotencyKey: key },
});
const mix = (key: string, spraySessionId: number): PendingWrite => ({
  ...base,
  kind: 'mix',
  spraySessionId,
  localId: -5,
  body: { productId: 1, wantedL: 1, tempC: 20, mixedAt: at, idempotencyKey: key },
});
const coat = (key: string, spraySessionId: number, mixId: number | null): PendingWrite => ({
  ...base,
  kind: 'coat',
  spraySessionId,
  body: {
    spraySessionId,
    partIds: [1],
    productId: 1,
    sprayedAt: at,
    airTempC: 20,
    relativeHumidityPct: 50,
    surfaceTempC: 19,
    thinningPct: 0,
    wetFilmUm: null,
    stepPosition: null,
    lotId: null,
    mixId,
    dryingTempC: null,
    acknowledgements: [],
    notes: '',
    reworkReason: null,
    idempotencyKey: key,
  } as Extract<PendingWrite, { kind: 'coat' }>['body'],
});

beforeEach(async () => {
  sent.length = 0;
  refuse.clear();
  for (const write of await queuedWrites()) await removeQueued(write.body.idempotencyKey);
});

describe('sending the writes kept on the tablet', () => {
  it('sends them in the order made, and a coat of a pot mixed offline names the pot the server recorded', async () => {
    for (const write of [
      start('start-0001', 7),
      mix('mix-00001', 7),
      coat('coat-0001', 7, -5),
      coat('coat-0002', 7, null),
    ])
      await queueWrite(write);
    await sendQueued();
    expect(sent).toEqual(['start-0001', 'mix-00001', 'coat-0001:mix=41', 'coat-0002:mix=null']);
    expect(await queuedWrites()).toEqual([]);
  });

  it('keeps a refused write with the server’s message and holds the later writes of its session, not of others', async () => {
    refuse.set('start-0002', new ApiError(409, 'conflict', 'Complete the pre-spray checklist before spraying'));
    for (const write of [start('start-0002', 7), coat('coat-0003', 7, null), coat('coat-0004', 8, null)])
      await queueWrite(write);
    await sendQueued();
    expect(sent).toEqual(['coat-0004:mix=null']);
    const left = await queuedWrites();
    expect(left.map((write) => [write.body.idempotencyKey, write.problem])).toEqual([
      ['start-0002', 'Complete the pre-spray checklist before spraying'],
      ['coat-0003', null],
    ]);
    expect([...heldBehindRefusal(left)]).toEqual(['coat-0003']);
  });

  it('stops the pass at a "not now" answer and keeps everything for the next one', async () => {
    refuse.set('coat-0005:mix=null', new ApiError(0, 'network', 'No connection'));
    for (const write of [coat('coat-0005', 7, null), coat('coat-0006', 8, null)]) await queueWrite(write);
    await sendQueued();
    expect(sent).toEqual([]);
    expect((await queuedWrites()).map((write) => [write.body.idempotencyKey, write.problem])).toEqual([
      ['coat-0005', null],
      ['coat-0006', null],
    ]);
  });
});

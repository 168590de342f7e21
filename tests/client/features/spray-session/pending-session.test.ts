import { describe, expect, it } from 'vitest';
import { mixQuantities } from '../../../../shared/finishing/material';
import type { Product } from '../../../../shared/schemas/product';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { pendingMixes, withPendingWrites } from '../../../../src/features/spray-session/utils/pending-session';
import type { PendingWrite } from '../../../../src/features/spray-session/utils/write-queue';

const saved = { id: 7, state: 'planned', checklist: null, clearingStartedAt: null } as SpraySession;
const checks = { extractionRunning: true, filtersChecked: true, faceVelocityMps: 0.55, respiratorFitted: true, respiratorKind: 'air-fed' as const, airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19, overrideReason: null };
const base = { spraySessionId: 7, label: 'x', queuedAt: '2027-03-01T10:00:00Z', problem: null };
const session = (key: string, body: object, problem: string | null = null): PendingWrite => ({ ...base, problem, kind: 'session', body: { changedAt: '2027-03-01T10:00:00Z', idempotencyKey: key, ...body } });

describe('the session as shown while writes wait on the tablet', () => {
  it('takes the checks with the tablet’s verdict, and the start and stop in the order made', () => {
    const writes = [
      { ...session('k-checks-1', { checklist: checks, state: 'spraying' }), verdict: { verdict: 'go' as const, problems: [], notes: [] } },
      session('k-stop-001', { state: 'clearing', changedAt: '2027-03-01T10:40:00Z' }),
    ];
    const { session: shown, checksWaiting } = withPendingWrites(saved, writes);
    expect(checksWaiting).toBe(true);
    expect(shown).toMatchObject({ state: 'clearing', clearingStartedAt: '2027-03-01T10:40:00Z', checklist: { ...checks, verdict: 'go', completedAt: '2027-03-01T10:00:00Z' } });
  });

  it('leaves out a write the server refused, and says the checks are not judged when the tablet could not judge them', () => {
    const { session: shown } = withPendingWrites(saved, [session('k-checks-2', { checklist: checks }), session('k-start-02', { state: 'spraying' }, 'Refused')]);
    expect(shown.state).toBe('planned');
    expect(shown.checklist?.problems).toEqual(['Not judged yet: the server judges the checks when they are sent.']);
  });

  it('works a pot out from its data sheet with the shared mixing maths, under its stand-in id', () => {
    const product = { id: 3, name: 'Primer', mixBaseParts: 2, mixHardenerParts: 1, inductionMin: 0, potLifeMin: null, dryingTimes: [] } as unknown as Product;
    const mix: PendingWrite = { ...base, kind: 'mix', localId: -9, body: { productId: 3, wantedL: 3, thinningPct: 10, tempC: 20, mixedAt: '2027-03-01T10:05:00Z', idempotencyKey: 'k-mix-0001' } };
    const [shown] = pendingMixes([mix], new Map([[3, product]]));
    // The same function the server records the pot with (server/services/mixes.ts), so the two agree.
    const expected = mixQuantities({ wantedL: 3, ratio: { base: 2, hardener: 1 }, thinningPct: 10, thinnerBasis: 'on-mix' });
    expect(shown).toMatchObject({ id: -9, productName: 'Primer', baseL: expected.baseL, hardenerL: expected.hardenerL, thinnerL: expected.thinnerL, potLifeEndsAt: null });
    expect(shown.totalL).toBeCloseTo(3, 10);
  });
});

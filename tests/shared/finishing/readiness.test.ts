import { describe, expect, it } from 'vitest';
import { coatTimes } from '../../../shared/finishing/coat-times';
import type { DryingTimes } from '../../../shared/finishing/drying-times';
import { partReadiness, type FinishStep, type PartCoat } from '../../../shared/finishing/readiness';

// Primer/sealer, denib with P320, two topcoats: a usual joinery system.
const steps: FinishStep[] = [
  { kind: 'coat', productId: 1, dryFilmUm: 40 },
  { kind: 'abrade', grit: 'P320' },
  { kind: 'coat', productId: 2, dryFilmUm: 30 },
  { kind: 'coat', productId: 2, dryFilmUm: 30 },
];
const times: DryingTimes = {
  flashOffMin: 10,
  recoatMinMin: 60,
  recoatMaxMin: 480,
  touchDryMin: 30,
  handleMin: 120,
  packMin: 720,
  fullCureH: 168,
};
const start = new Date('2025-02-03T08:00:00Z');
const hours = (h: number) => new Date(start.getTime() + h * 3_600_000);
const coat = (stepIndex: number, sprayedAt: Date, dryingTimes: DryingTimes = times): PartCoat => ({
  stepIndex,
  sprayedAt,
  ...coatTimes(sprayedAt, dryingTimes),
});

describe('partReadiness', () => {
  it('dries a part with no finish system from its latest coat', () => {
    // Times from the coat itself (coatTimes: sprayed + handle 120 min, pack 720 min, cure 168 h).
    const loose = [coatTimes(start, times), coatTimes(hours(1), times)].map((t, i) => ({ ...t, sprayedAt: i === 0 ? start : hours(1) }));
    expect(partReadiness({ steps: [], coats: [], unplannedCoats: loose, now: hours(2) })).toMatchObject({ state: 'drying', coatsDone: 2, coatsTotal: 0, nextStep: null, handleAt: hours(3), packAt: hours(13), fullCureAt: hours(169) });
    expect(partReadiness({ steps: [], coats: [], unplannedCoats: loose, now: hours(3) }).state).toBe('ready-to-handle');
    expect(partReadiness({ steps: [], coats: [], unplannedCoats: [], now: hours(3) })).toMatchObject({ state: 'waiting', coatsDone: 0, handleAt: null });
    // With a finish system, coats outside it do not count.
    expect(partReadiness({ steps, coats: [], unplannedCoats: loose, now: hours(2) })).toMatchObject({ state: 'waiting', coatsDone: 0 });
  });

  it('is waiting before the first coat', () => {
    const result = partReadiness({ steps, coats: [], now: start });
    expect(result).toMatchObject({ state: 'waiting', coatsDone: 0, coatsTotal: 3, nextStepIndex: 0, abradeRequired: false, handleAt: null });
    expect(result.nextStep).toEqual(steps[0]);
  });

  it('asks for the planned denib after the primer and shows the primer’s window', () => {
    const primer = coat(0, start);
    const result = partReadiness({ steps, coats: [primer], now: hours(0.5) });
    expect(result).toMatchObject({ state: 'in-finish', coatsDone: 1, nextStepIndex: 1, abradeRequired: true, recoatWindowMissed: false });
    expect(result.nextStep).toEqual({ kind: 'abrade', grit: 'P320' });
    expect(result.nextWindow).toEqual({ opensAt: primer.recoatOpensAt, closesAt: primer.recoatClosesAt });
  });

  it('moves on to the topcoat once the denib is done, with no closing time', () => {
    const result = partReadiness({ steps, coats: [coat(0, start)], abradedAt: [hours(1.5)], now: hours(2) });
    expect(result).toMatchObject({ state: 'in-finish', nextStepIndex: 2, abradeRequired: false });
    // The primer's own recoat opening (60 min) still holds; the sanding only removes the closing time.
    expect(result.nextWindow).toEqual({ opensAt: hours(1), closesAt: null });
  });

  it('keeps the coat’s recoat opening when the denib came early', () => {
    const result = partReadiness({ steps, coats: [coat(0, start)], abradedAt: [hours(0.5)], now: hours(0.75) });
    expect(result).toMatchObject({ abradeRequired: false, nextStepIndex: 2, nextWindow: { opensAt: hours(1), closesAt: null } });
  });

  it('asks for a sanding of the bare part first when the system starts with one, until one is on record', () => {
    const sandFirst: FinishStep[] = [{ kind: 'abrade', grit: 'P180' }, ...steps];
    expect(partReadiness({ steps: sandFirst, coats: [], now: start })).toMatchObject({ state: 'waiting', abradeRequired: true, nextStepIndex: 0 });
    expect(partReadiness({ steps: sandFirst, coats: [], abradedAt: [start], now: hours(1) })).toMatchObject({ state: 'waiting', abradeRequired: false, nextStepIndex: 1 });
  });

  it('ignores a sanding done before the latest coat', () => {
    const result = partReadiness({ steps, coats: [coat(0, start), coat(2, hours(3))], abradedAt: [hours(1.5)], now: hours(12) });
    expect(result).toMatchObject({ abradeRequired: true, nextStepIndex: null, recoatWindowMissed: true });
  });

  it('offers the next topcoat inside the window', () => {
    const first = coat(2, hours(3));
    const result = partReadiness({ steps, coats: [coat(0, start), first], now: hours(5) });
    expect(result).toMatchObject({ state: 'in-finish', coatsDone: 2, nextStepIndex: 3, abradeRequired: false, recoatWindowMissed: false });
    expect(result.nextWindow).toEqual({ opensAt: hours(4), closesAt: hours(11) });
    expect(result.handleAt).toEqual(first.handleAt);
  });

  it('inserts a scuff before the next coat once the window has closed', () => {
    const result = partReadiness({ steps, coats: [coat(0, start), coat(2, hours(3))], now: hours(11) });
    expect(result).toMatchObject({ state: 'in-finish', abradeRequired: true, recoatWindowMissed: true, nextStepIndex: null, nextWindow: null });
    expect(result.nextStep).toEqual({ kind: 'abrade', grit: 'P320' });
  });

  it('lets the coat go on after the scuff', () => {
    const result = partReadiness({ steps, coats: [coat(0, start), coat(2, hours(3))], abradedAt: [hours(20)], now: hours(21) });
    expect(result).toMatchObject({ abradeRequired: false, nextStepIndex: 3, nextWindow: { opensAt: hours(4), closesAt: null } });
  });

  it('never asks for a scuff when the product has no latest recoat time', () => {
    const open = { ...times, recoatMaxMin: null };
    const result = partReadiness({ steps, coats: [coat(0, start), coat(2, hours(3), open)], now: hours(24 * 30) });
    expect(result).toMatchObject({ abradeRequired: false, recoatWindowMissed: false, nextStepIndex: 3 });
    expect(result.nextWindow?.closesAt).toBeNull();
  });

  it('follows the last coat through drying, handling, packing and cure', () => {
    const coats = [coat(0, start), coat(2, hours(3)), coat(3, hours(5))];
    const stateAt = (h: number) => partReadiness({ steps, coats, now: hours(h) }).state;
    expect(stateAt(6)).toBe('drying');
    expect(stateAt(7)).toBe('ready-to-handle');
    expect(stateAt(17)).toBe('ready-to-pack');
    expect(stateAt(5 + 168)).toBe('cured');
    const done = partReadiness({ steps, coats, now: hours(6) });
    expect(done).toMatchObject({ coatsDone: 3, coatsTotal: 3, nextStep: null, nextWindow: null, abradeRequired: false });
    expect(done.packAt).toEqual(hours(17));
  });

  it('is collected once picked up, whatever its drying state', () => {
    const coats = [coat(0, start), coat(2, hours(3)), coat(3, hours(5))];
    expect(partReadiness({ steps, coats, collectedAt: hours(18), now: hours(19) }).state).toBe('collected');
    expect(partReadiness({ steps, coats, collectedAt: hours(18), now: hours(17.5) }).state).toBe('ready-to-pack');
  });

  it('counts a re-sprayed step once and dates it from the later spraying', () => {
    const result = partReadiness({ steps, coats: [coat(0, start), coat(0, hours(2))], now: hours(2.5) });
    expect(result.coatsDone).toBe(1);
    expect(result.nextWindow?.opensAt).toEqual(hours(3));
  });

  it('refuses a coat that points at an abrade step', () => {
    expect(() => partReadiness({ steps, coats: [coat(1, start)], now: hours(1) })).toThrow(
      expect.objectContaining({ field: 'coats.0.stepIndex' }),
    );
  });
});

import { describe, expect, it } from 'vitest';
import { coatTimes } from '../../../shared/finishing/coat-times';
import { jobLifeCycle, jobStateAt } from '../../../shared/finishing/job-state';
import { partReadiness, type FinishStep, type PartCoat } from '../../../shared/finishing/readiness';

// The life cycle is the product's own rule (open → in finish → ready → delivered), not a trade formula.
const steps: FinishStep[] = [
  { kind: 'coat', productId: 1, dryFilmUm: 40 },
  { kind: 'coat', productId: 1, dryFilmUm: 40 },
];
const start = new Date('2026-03-02T08:00:00Z');
const hours = (h: number) => new Date(start.getTime() + h * 3_600_000);
const coat = (stepIndex: number, at: Date): PartCoat => ({
  stepIndex,
  sprayedAt: at,
  ...coatTimes(at, { flashOffMin: 10, recoatMinMin: 60, recoatMaxMin: null, touchDryMin: 20, handleMin: 120, packMin: 480, fullCureH: 168 }),
});
const part = (coats: PartCoat[], now: Date, collectedAt: Date | null = null) => partReadiness({ steps, coats, collectedAt, now });

describe('jobLifeCycle', () => {
  it('is open with no parts, or before any coat', () => {
    expect(jobLifeCycle([], start)).toEqual({ state: 'open', readyAt: null });
    expect(jobLifeCycle([part([], start), part([], start)], start)).toEqual({ state: 'open', readyAt: null });
  });

  it('is in finish from the first coat while a part still needs a coat', () => {
    expect(jobLifeCycle([part([coat(0, start)], hours(1)), part([], hours(1))], hours(1))).toEqual({ state: 'in-finish', readyAt: null });
  });

  it('turns ready when the last part can be handled, and says when that is beforehand', () => {
    // Second coats at 10:00 and 11:00; handle 120 min after each: the job is ready at 13:00.
    const parts = (now: Date) => [part([coat(0, start), coat(1, hours(2))], now), part([coat(0, start), coat(1, hours(3))], now)];
    expect(jobLifeCycle(parts(hours(4)), hours(4))).toEqual({ state: 'in-finish', readyAt: hours(5) });
    expect(jobLifeCycle(parts(hours(5)), hours(5))).toEqual({ state: 'ready', readyAt: hours(5) });
  });

  it('counts only parts still on the racks, and is delivered once every part is collected', () => {
    const done = part([coat(0, start), coat(1, hours(2))], hours(6));
    const gone = part([coat(0, start)], hours(6), hours(5));
    expect(jobLifeCycle([done, gone], hours(6))).toEqual({ state: 'ready', readyAt: hours(4) });
    expect(jobLifeCycle([part([coat(0, start), coat(1, hours(2))], hours(6), hours(5)), gone], hours(6))).toEqual({ state: 'delivered', readyAt: null });
  });

  it('never calls a part with no finish system ready', () => {
    const noSystem = partReadiness({ steps: [], coats: [], now: hours(1) });
    expect(jobLifeCycle([part([coat(0, start), coat(1, hours(0))], hours(9)), noSystem], hours(9)).state).toBe('in-finish');
  });
});

describe('jobStateAt', () => {
  it('shows an in-finish job as ready once its ready time has passed, and leaves every other state alone', () => {
    expect(jobStateAt('in-finish', hours(5).toISOString(), hours(4))).toBe('in-finish');
    expect(jobStateAt('in-finish', hours(5).toISOString(), hours(5))).toBe('ready');
    expect(jobStateAt('in-finish', null, hours(50))).toBe('in-finish');
    expect(jobStateAt('delivered', hours(5).toISOString(), hours(6))).toBe('delivered');
  });
});

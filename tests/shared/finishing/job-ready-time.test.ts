import { describe, expect, it } from 'vitest';
import { coatTimes } from '../../../shared/finishing/coat-times';
import type { DryingRow } from '../../../shared/finishing/drying-times';
import { jobReadyTime, partReadyTime, type PartReadyInput } from '../../../shared/finishing/job-ready-time';
import type { FinishStep, PartCoat } from '../../../shared/finishing/readiness';
import type { ProductDryingTable } from '../../../shared/finishing/system-time';

// Invented products, the same as the time-through-system tests: the sealer has rows at 20 °C and
// 10 °C; the topcoat one row at 20 °C, so at any other temperature the ten-degree rule scales it.
const row = (tempC: number, recoatMinMin: number, recoatMaxMin: number | null, packMin: number): DryingRow => ({
  tempC,
  flashOffMin: 10,
  recoatMinMin,
  recoatMaxMin,
  touchDryMin: 20,
  handleMin: packMin / 2,
  packMin,
  fullCureH: 168,
});
const sealerId = 1;
const topcoatId = 2;
const tables = new Map<number, ProductDryingTable>([
  [sealerId, { dryingTimes: [row(20, 60, 480, 480), row(10, 240, 1920, 1920)], minApplicationTempC: 5 }],
  [topcoatId, { dryingTimes: [row(20, 90, null, 600)], minApplicationTempC: 5 }],
]);
const steps: FinishStep[] = [
  { kind: 'coat', productId: sealerId, dryFilmUm: 40 },
  { kind: 'abrade', grit: 'P320' },
  { kind: 'coat', productId: topcoatId, dryFilmUm: 30 },
  { kind: 'coat', productId: topcoatId, dryFilmUm: 30 },
];
const start = new Date('2026-03-02T08:00:00Z');
const minutes = (m: number) => new Date(start.getTime() + m * 60_000);
// A sealer coat dried at 20 °C: its own 20 °C row (recoat opens after 60 min, closes after 480, handle 240, pack 480).
const sealerCoat = (at: Date): PartCoat => ({ stepIndex: 0, sprayedAt: at, ...coatTimes(at, { flashOffMin: 10, recoatMinMin: 60, recoatMaxMin: 480, touchDryMin: 20, handleMin: 240, packMin: 480, fullCureH: 168 }) });
const topcoat = (stepIndex: number, at: Date): PartCoat => ({ stepIndex, sprayedAt: at, ...coatTimes(at, { flashOffMin: 10, recoatMinMin: 90, recoatMaxMin: null, touchDryMin: 20, handleMin: 300, packMin: 600, fullCureH: 168 }) });
const part = (over: Partial<PartReadyInput> = {}): PartReadyInput => ({ steps, coats: [], now: start, ...over });
const cold = { tables, tempC: 10 };

describe('partReadyTime', () => {
  it('projects a part with no coats through the whole system at the shop temperature (hand-worked at 10 °C)', () => {
    // Hand-worked, each coat going on as soon as the previous one's recoat window opens:
    //   sealer at 10 °C is its own 10 °C row: recoat opens after 240 min
    //   denib P320: 15 min (common practice, no published source)
    //   topcoat has one row at 20 °C; at 10 °C the ten-degree rule t(T) = t_ref · 2^((T_ref − T)/10)
    //   (DESIGN.md §4.1; trade reference §4.4, en1.nbchao.com: about twice the time at 10 °C as at 20 °C) gives ×2:
    //     recoat 90 × 2 = 180 min, last coat pack 600 × 2 = 1200 min, handle 300 × 2 = 600 min
    //   pack:   240 + 15 + 180 + 1200 = 1635 min after now
    //   handle: 240 + 15 + 180 +  600 = 1035 min after now
    const result = partReadyTime(part(), cold);
    expect(result).toMatchObject({ coatsRemaining: 3, projected: true, unknown: false });
    expect(result.nextCoatAt).toEqual(start);
    expect(result.packAt).toEqual(minutes(1635));
    expect(result.handleAt).toEqual(minutes(1035));
  });

  it('after the sealer, waits for its window to open and the planned denib, then counts the two topcoats', () => {
    // Sealer sprayed at 08:00, its window opens at 09:00. Now is 08:30.
    //   next coat: 09:00 + 15 min denib = 09:15 (75 min after 08:00)
    //   then topcoat recoat 180 + pack 1200 = 1380 min → pack at 75 + 1380 = 1455 min after 08:00
    //   handle: 75 + 180 + 600 = 855 min after 08:00
    const result = partReadyTime(part({ coats: [sealerCoat(start)], now: minutes(30) }), cold);
    expect(result.readiness.abradeRequired).toBe(true);
    expect(result).toMatchObject({ coatsRemaining: 2, projected: true });
    expect(result.nextCoatAt).toEqual(minutes(75));
    expect(result.packAt).toEqual(minutes(1455));
    expect(result.handleAt).toEqual(minutes(855));
  });

  it('counts no denib time once the denib is on record', () => {
    // Denibbed at 08:40; the window opens 09:00 → next coat at 09:00; pack 60 + 1380 = 1440 min after 08:00.
    const result = partReadyTime(part({ coats: [sealerCoat(start)], abradedAt: [minutes(40)], now: minutes(45) }), cold);
    expect(result.readiness.abradeRequired).toBe(false);
    expect(result.nextCoatAt).toEqual(minutes(60));
    expect(result.packAt).toEqual(minutes(1440));
  });

  it('after a missed window, starts from now plus the scuff the readiness rules insert', () => {
    // The sealer's window closed at 16:00 (480 min). Now 18:00 (600 min): scuff 15 min → next coat at 615 min.
    const result = partReadyTime(part({ coats: [sealerCoat(start)], now: minutes(600) }), cold);
    expect(result.readiness.recoatWindowMissed).toBe(true);
    expect(result.nextCoatAt).toEqual(minutes(615));
    expect(result.packAt).toEqual(minutes(615 + 1380));
  });

  it('never starts the next coat before the session booked for it', () => {
    const booked = minutes(24 * 60);
    // A session for step 3 (the second topcoat) does not hold back step 2; the one for step 2 does.
    const bookings = [{ startAt: minutes(2 * 60), stepIndex: 3 }, { startAt: booked, stepIndex: 2 }];
    const result = partReadyTime(part({ coats: [sealerCoat(start)], abradedAt: [minutes(40)], now: minutes(45), bookings }), cold);
    expect(result.nextCoatAt).toEqual(booked);
    expect(result.handleAt).toEqual(minutes(24 * 60 + 180 + 600));
  });

  it('uses the last coat’s own times once every coat is on', () => {
    const coats = [sealerCoat(start), topcoat(2, minutes(120)), topcoat(3, minutes(240))];
    const result = partReadyTime(part({ coats, abradedAt: [minutes(70)], now: minutes(250) }), cold);
    expect(result).toMatchObject({ coatsRemaining: 0, projected: false, nextCoatAt: null });
    expect(result.handleAt).toEqual(coats[2].handleAt);
    expect(result.packAt).toEqual(coats[2].packAt);
  });

  it('cannot say for a part without a finish system, or whose product has no drying times', () => {
    expect(partReadyTime(part({ steps: [] }), cold)).toMatchObject({ unknown: true, handleAt: null });
    expect(partReadyTime(part(), { tables: new Map(), tempC: 10 })).toMatchObject({ unknown: true, handleAt: null, projected: true });
  });

  it('counts a sanding of the bare part when the system starts with one', () => {
    const sandFirst: FinishStep[] = [{ kind: 'abrade', grit: 'P180' }, ...steps];
    // Not sanded yet: 15 min of sanding before the sealer; sanded: the sealer can go on now.
    expect(partReadyTime(part({ steps: sandFirst }), cold).nextCoatAt).toEqual(minutes(15));
    expect(partReadyTime(part({ steps: sandFirst, abradedAt: [start] }), cold).nextCoatAt).toEqual(start);
  });
});

describe('jobReadyTime', () => {
  it('is the latest of the parts still on the racks, and says it is an estimate while coats remain', () => {
    const done = part({ coats: [sealerCoat(start), topcoat(2, minutes(120)), topcoat(3, minutes(240))], abradedAt: [minutes(70)], now: minutes(30) });
    const fresh = part({ now: minutes(30) });
    const result = jobReadyTime([done, fresh], cold);
    // The fresh part: pack 1635 min and handle 1035 min after now (08:30), as hand-worked above.
    expect(result.packAt).toEqual(minutes(30 + 1635));
    expect(result.handleAt).toEqual(minutes(30 + 1035));
    expect(result).toMatchObject({ coatsRemaining: 3, partsCounted: 2, partsCollected: 0, projected: true, lastPartIndex: 1 });
  });

  it('leaves collected parts out and gives no time while a part’s time is unknown', () => {
    const collected = part({ collectedAt: start, now: minutes(1) });
    const fine = part({ coats: [sealerCoat(start), topcoat(2, minutes(120)), topcoat(3, minutes(240))], abradedAt: [minutes(70)], now: minutes(300) });
    const whole = jobReadyTime([collected, fine], cold);
    expect(whole).toMatchObject({ partsCounted: 1, partsCollected: 1, projected: false });
    expect(whole.handleAt).toEqual(minutes(240 + 300));
    expect(jobReadyTime([fine, part({ steps: [] })], cold)).toMatchObject({ handleAt: null, packAt: null, partsUnknown: 1 });
  });

  it('has no time when every part is collected', () => {
    expect(jobReadyTime([part({ collectedAt: start, now: minutes(1) })], cold)).toMatchObject({ handleAt: null, partsCounted: 0, partsCollected: 1 });
  });

  it('passes on a drying warning once, e.g. a shop colder than a product allows', () => {
    // 3 °C is below both products' 5 °C minimum and below the sealer's coldest row: two parts, each warning once.
    const result = jobReadyTime([part(), part()], { tables, tempC: 3 });
    expect(result.warnings.map((w) => w.code).sort()).toEqual(['below-min-application-temp', 'outside-data-sheet-temps']);
  });
});

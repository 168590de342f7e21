import { describe, expect, it } from 'vitest';
import { jobRisk, sensorIsStale, sessionNextStep, type NextStepCoat, type NextStepInput } from '../../../shared/finishing/day-board';
import { projectedRecoatWindow, sharedRecoatWindow } from '../../../shared/finishing/recoat-window';

// The order of work in a spray session is the product's own (DESIGN.md §5): no spraying without
// the checklist, a two-pack sprayed from a pot in its pot life, protection kept on until the air clears.
const now = new Date('2027-01-04T10:00:00Z');
const coat = (overrides: Partial<NextStepCoat> = {}): NextStepCoat => ({ coatNumber: 1, coatsTotal: 3, productName: 'Primer', partCount: 8, sprayedCount: 0, needsMix: true, mixed: true, ...overrides });
const step = (overrides: Partial<NextStepInput>) => sessionNextStep({ state: 'planned', checklist: null, coats: [coat()], clearanceEndsAt: null, now, ...overrides });
const go = { verdict: 'go' as const, overrideReason: null };

describe('sessionNextStep', () => {
  it('asks for the checklist first, and for a lead when it says stop', () => {
    expect(step({}).kind).toBe('checklist');
    expect(step({ state: 'checking', checklist: { verdict: 'stop', overrideReason: null } }).kind).toBe('checklist-stop');
    expect(step({ state: 'checking', checklist: { verdict: 'stop', overrideReason: 'Dehumidifier on' } }).kind).toBe('start-spraying');
    expect(step({ state: 'checking', checklist: go }).words).toBe('Checklist done: start spraying');
  });

  it('asks for a pot of a two-pack before its coat, then names the coat and the parts left', () => {
    expect(step({ state: 'spraying', checklist: go, coats: [coat({ mixed: false })] }).words).toBe('Mix Primer (no pot in its pot life yet)');
    expect(step({ state: 'spraying', checklist: go, coats: [coat({ needsMix: false, mixed: false })] }).kind).toBe('coat');
    expect(step({ state: 'spraying', checklist: go, coats: [coat({ sprayedCount: 7 })] }).words).toBe('Coat 1 of 3: Primer on 1 part');
    const second = [coat({ sprayedCount: 8 }), coat({ coatNumber: 2, productName: 'Topcoat', partCount: 4 })];
    expect(step({ state: 'spraying', checklist: go, coats: second }).words).toBe('Coat 2 of 3: Topcoat on 4 parts');
    expect(step({ state: 'spraying', checklist: go, coats: [coat({ sprayedCount: 8 })] }).kind).toBe('stop-spraying');
  });

  it('sends nobody to check a booth for a session whose parts have all had their coat elsewhere', () => {
    const sprayed = [coat({ sprayedCount: 8 }), coat({ coatNumber: 2, partCount: 4, sprayedCount: 4 })];
    expect(step({ coats: sprayed })).toEqual({ kind: 'done', words: 'Nothing left to spray: every planned part has had its coat. Ask the lead to cancel or re-plan this session', at: null });
    expect(step({ state: 'checking', checklist: go, coats: sprayed }).kind).toBe('done');
    expect(step({ coats: [coat({ sprayedCount: 8 }), coat({ coatNumber: 2, partCount: 4, sprayedCount: 3 })] }).kind).toBe('checklist');
    // No parts planned: the session is still run as booked.
    expect(step({ coats: [] }).kind).toBe('checklist');
  });

  it('keeps protection on until the clearance time has passed', () => {
    const clearAt = new Date('2027-01-04T10:12:00Z');
    expect(step({ state: 'clearing', clearanceEndsAt: clearAt })).toEqual({ kind: 'clearance', words: 'Clearing the air: keep protection on and others out until', at: clearAt });
    expect(step({ state: 'clearing', clearanceEndsAt: new Date('2027-01-04T09:59:00Z') }).kind).toBe('finish');
    expect(step({ state: 'done' }).kind).toBe('done');
  });
});

describe('jobRisk', () => {
  it('flags an overdue job, a plan that packs after the due date, and a plan that does not fit', () => {
    expect(jobRisk({ dueDate: '2027-01-03', today: '2027-01-04', readyToPackOn: '2027-01-04', coatsLeft: true })?.reason).toBe('overdue');
    expect(jobRisk({ dueDate: '2027-01-04', today: '2027-01-04', readyToPackOn: '2027-01-05', coatsLeft: true })).toEqual({ reason: 'finishes-late', words: 'Ready to pack 2027-01-05 at the earliest, after the due date' });
    expect(jobRisk({ dueDate: '2027-01-09', today: '2027-01-04', readyToPackOn: null, coatsLeft: true })?.reason).toBe('cannot-plan');
  });

  it('leaves a job alone that packs on or before its due date, or has no coats left', () => {
    expect(jobRisk({ dueDate: '2027-01-05', today: '2027-01-04', readyToPackOn: '2027-01-05', coatsLeft: true })).toBeNull();
    expect(jobRisk({ dueDate: '2027-01-05', today: '2027-01-04', readyToPackOn: null, coatsLeft: false })).toBeNull();
  });
});

describe('sensorIsStale', () => {
  it('counts a sensor stale after half an hour without a reading, or with none at all', () => {
    expect(sensorIsStale(null, now)).toBe(true);
    expect(sensorIsStale(new Date('2027-01-04T09:30:00Z'), now)).toBe(false);
    expect(sensorIsStale(new Date('2027-01-04T09:29:00Z'), now)).toBe(true);
  });
});

describe('recoat windows', () => {
  const row = { tempC: 20, flashOffMin: 10, recoatMinMin: 120, recoatMaxMin: 1440, touchDryMin: 30, handleMin: 180, packMin: 480, fullCureH: 168 };

  it('projects a booked coat’s window from its session’s end and the data sheet row', () => {
    // At the row's own temperature the times apply as printed: opens +120 min, closes +1440 min, pack +480 min.
    expect(projectedRecoatWindow(now, [row], 20)).toEqual({ opensAt: new Date('2027-01-04T12:00:00Z'), closesAt: new Date('2027-01-05T10:00:00Z'), packAt: new Date('2027-01-04T18:00:00Z') });
    // 10 °C colder doubles every time (the one-row rule of thumb: common practice, no published source).
    expect(projectedRecoatWindow(now, [row], 10).opensAt).toEqual(new Date('2027-01-04T14:00:00Z'));
  });

  it('shares a window between parts: it opens with the last and closes with the first', () => {
    const a = { opensAt: new Date('2027-01-04T11:00:00Z'), closesAt: new Date('2027-01-05T09:00:00Z') };
    const b = { opensAt: new Date('2027-01-04T12:00:00Z'), closesAt: null };
    expect(sharedRecoatWindow([a, b])).toEqual({ opensAt: b.opensAt, closesAt: a.closesAt });
    expect(sharedRecoatWindow([b])).toEqual(b);
    expect(sharedRecoatWindow([])).toBeNull();
  });
});

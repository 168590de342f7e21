import { describe, expect, it } from 'vitest';
import type { ReadyPart } from '../../../../shared/schemas/ready';
import { groupByJob } from '../../../../src/features/ready-board/components/board-groups';
import { stateAt, toBoardPart } from '../../../../src/features/ready-board/components/readiness';
import { partLines, timeUntil } from '../../../../src/features/ready-board/components/readiness-words';
import { summariseForWall } from '../../../../src/features/ready-board/components/wall-summary';

const zone = 'Europe/London';
const at = (iso: string) => new Date(iso);

function part(fields: Partial<ReadyPart>): ReadyPart {
  return {
    id: 1,
    label: 'Door 1',
    jobId: 5,
    jobReference: 'LJ-26-105',
    customer: 'Ardent Bathrooms',
    state: 'drying',
    coatsDone: 3,
    coatsTotal: 3,
    nextStep: null,
    nextWindowOpensAt: null,
    nextWindowClosesAt: null,
    abradeRequired: false,
    handleAt: '2026-12-02T10:42:00.000Z',
    packAt: '2026-12-02T16:00:00.000Z',
    fullCureAt: '2026-12-09T10:00:00.000Z',
    rack: { id: 1, name: 'Rack A', shelf: 3 },
    ...fields,
  };
}

describe('stateAt', () => {
  it('turns a drying part ready to handle at its handle time, not before', () => {
    expect(stateAt(part({}), at('2026-12-02T10:41:59Z'))).toBe('drying');
    expect(stateAt(part({}), at('2026-12-02T10:42:00Z'))).toBe('ready-to-handle');
    expect(stateAt(part({}), at('2026-12-02T16:00:00Z'))).toBe('ready-to-pack');
    expect(stateAt(part({}), at('2026-12-10T00:00:00Z'))).toBe('cured');
  });
  it('never shows a part behind what the server said, even if the device clock is slow', () => {
    expect(stateAt(part({ state: 'ready-to-pack' }), at('2026-12-02T09:00:00Z'))).toBe('ready-to-pack');
  });
  it('leaves parts between coats, waiting or collected as the server said', () => {
    for (const state of ['in-finish', 'waiting', 'collected'] as const) expect(stateAt(part({ state }), at('2026-12-20T00:00:00Z'))).toBe(state);
  });
});

describe('partLines', () => {
  it('counts down to handling in whole minutes, rounded up', () => {
    expect(timeUntil('2026-12-02T10:42:00Z', at('2026-12-02T09:21:30Z'))).toBe('1 h 21 min');
    expect(timeUntil('2026-12-02T10:42:00Z', at('2026-12-02T10:41:59Z'))).toBe('1 min');
    expect(partLines(toBoardPart(part({}), at('2026-12-02T09:22:00Z')), at('2026-12-02T09:22:00Z'), zone)).toEqual({
      headline: 'Handle in 1 h 20 min',
      details: ['Pack in 6 h 38 min', 'Full cure in 7 d 1 h'],
    });
  });
  it('says since when a part has been ready, in the shop’s time', () => {
    const now = at('2026-12-02T11:00:00Z');
    expect(partLines(toBoardPart(part({}), now), now, zone).headline).toBe('Ready to handle since 10:42');
    const summer = part({ handleAt: '2026-07-01T09:42:00Z', packAt: null, fullCureAt: null });
    expect(partLines(toBoardPart(summer, at('2026-07-01T10:00:00Z')), at('2026-07-01T10:00:00Z'), zone).headline).toBe('Ready to handle since 10:42');
  });
  it('names the denib and the window for a part between coats, and a window that closed since the last answer', () => {
    const between = part({ state: 'in-finish', coatsDone: 1, nextStep: 'Abrade P320', abradeRequired: true, nextWindowOpensAt: '2026-12-02T11:00:00Z', nextWindowClosesAt: '2026-12-02T20:00:00Z', handleAt: '2026-12-02T12:00:00Z' });
    const now = at('2026-12-02T10:30:00Z');
    expect(partLines(toBoardPart(between, now), now, zone).details).toEqual(['Denib P320 needed', 'Next coat from 11:00 (in 30 min)', 'Handle in 1 h 30 min']);
    const late = at('2026-12-02T20:00:00Z');
    expect(partLines(toBoardPart(between, late), late, zone).details.slice(0, 2)).toEqual(['Recoat window closed at 20:00', 'Denib P320 needed before the next coat']);
  });
});

describe('grouping', () => {
  const now = at('2026-12-02T11:00:00Z');
  const parts = [
    part({ id: 1, jobId: 1, jobReference: 'LJ-26-101', state: 'waiting', handleAt: null, packAt: null, fullCureAt: null, coatsDone: 0 }),
    part({ id: 2, jobId: 5, label: 'Door 10' }),
    part({ id: 3, jobId: 5, label: 'Door 2', handleAt: '2026-12-02T12:00:00Z' }),
  ].map((p) => toBoardPart(p, now));

  it('puts jobs with parts to pick up first, and those parts first within the job', () => {
    const groups = groupByJob(parts);
    expect(groups.map((g) => g.title)).toEqual(['LJ-26-105', 'LJ-26-101']);
    expect(groups[0].parts.map((p) => p.label)).toEqual(['Door 10', 'Door 2']);
  });
  it('gives the wall the active jobs as cards and the waiting ones in a line', () => {
    const summary = summariseForWall(parts, 5);
    expect(summary.activeJobs.map((j) => [j.reference, j.counts])).toEqual([['LJ-26-105', { 'ready-to-handle': 1, drying: 1 }]]);
    expect(summary.waitingJobs).toEqual([{ reference: 'LJ-26-101', parts: 1 }]);
    expect(summary.nextReady.map((p) => p.label)).toEqual(['Door 2']);
  });
});

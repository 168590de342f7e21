import { describe, expect, it } from 'vitest';
import { compareForBoard, stateAt, summariseForWall, type WallLimits } from '../../../shared/finishing/wall-summary';
import type { ReadyPart } from '../../../shared/schemas/ready';
import { readyPart } from '../ready-part-fixture';

// The summary is the board's own bookkeeping (counting, ordering, limits), not trade maths: every
// expected value below is worked out by hand from the parts listed in each test.

const dayMs = 86_400_000;
const limits: WallLimits = { jobs: 6, next: 6, waiting: 12, collectedForMs: 7 * dayMs };
const now = new Date('2026-12-02T11:00:00Z');

// Expected times are the board's estimates while coats remain; the wall reads only the recorded ones.
const part = (fields: Partial<ReadyPart>): ReadyPart => readyPart({ expectedHandleAt: null, expectedPackAt: null, ...fields });

const waiting = { state: 'waiting', handleAt: null, packAt: null, fullCureAt: null, coatsDone: 0, rack: null } as const;
const between = { state: 'in-finish', coatsDone: 1, handleAt: '2026-12-02T12:30:00.000Z', packAt: null, fullCureAt: null } as const;

describe('summariseForWall', () => {
  const board = [
    part({ id: 1, jobId: 1, jobReference: 'LJ-26-101', ...waiting }),
    part({ id: 2, jobId: 5, label: 'Door 10' }),
    part({ id: 3, jobId: 5, label: 'Door 2', handleAt: '2026-12-02T12:00:00.000Z', packAt: '2026-12-02T18:00:00.000Z' }),
    part({ id: 4, jobId: 7, jobReference: 'LJ-26-107', customer: 'Holm Kitchens', label: 'Panel 1', ...between }),
  ];

  it('gives the active jobs as cards, counted at its moment, the most to pick up first, and the waiting ones in a line', () => {
    const summary = summariseForWall(board, now, limits);
    // Door 10's handle time (10:42) has passed at 11:00; Door 2's (12:00) has not.
    expect(summary.jobs.map((j) => [j.jobReference, j.counts, j.partsLeft])).toEqual([
      ['LJ-26-105', { 'ready-to-handle': 1, drying: 1 }, 2],
      ['LJ-26-107', { 'in-finish': 1 }, 1],
    ]);
    expect(summary.jobsInFinish).toBe(2);
    expect(summary.waitingJobs).toEqual([{ jobReference: 'LJ-26-101', parts: 1 }]);
    expect(summary.waitingJobsCount).toBe(1);
    expect(summary.nextReady).toEqual([{ id: 3, label: 'Door 2', jobReference: 'LJ-26-105', handleAt: '2026-12-02T12:00:00.000Z', rack: { id: 1, name: 'Rack A', shelf: 3 } }]);
    expect(summary.totals).toEqual({ waiting: 1, 'ready-to-handle': 1, drying: 1, 'in-finish': 1 });
    expect(summary.asOf).toBe(now.toISOString());
  });

  it('carries the next instant each job’s counts change by themselves, and the soonest of them', () => {
    const summary = summariseForWall(board, now, limits);
    // LJ-26-105: Door 2 handles at 12:00, before Door 10 packs at 16:00. A part between coats keeps
    // its state until the next coat is logged, so LJ-26-107's 12:30 between-coats time is no change.
    expect(summary.jobs.map((j) => j.nextChangeAt)).toEqual(['2026-12-02T12:00:00.000Z', null]);
    expect(summary.nextChangeAt).toBe('2026-12-02T12:00:00.000Z');
    const later = summariseForWall(board, new Date('2026-12-02T12:00:00Z'), limits);
    expect(later.jobs[0].counts).toEqual({ 'ready-to-handle': 2 });
    expect(later.jobs[0].nextChangeAt).toBe('2026-12-02T16:00:00.000Z');
    expect(later.nextReady).toEqual([]);
  });

  it('counts a collected part until it leaves the board, and says when it will', () => {
    const collected = part({ id: 9, state: 'collected', rack: null, collectedAt: '2026-12-01T09:00:00.000Z', handleAt: '2026-11-30T09:00:00.000Z', packAt: null, fullCureAt: null });
    const summary = summariseForWall([collected, part({ id: 2, packAt: null, fullCureAt: null })], now, limits);
    expect(summary.jobs[0].counts).toEqual({ collected: 1, 'ready-to-handle': 1 });
    expect(summary.jobs[0].partsLeft).toBe(1);
    // Collected 1 December 09:00 + 7 days.
    expect(summary.jobs[0].nextChangeAt).toBe('2026-12-08T09:00:00.000Z');
    // A job whose every part is collected has nothing left to show.
    expect(summariseForWall([collected], now, limits).jobs).toEqual([]);
  });

  it('sends only as many cards, waiting jobs and parts as asked, with the full counts', () => {
    const many = Array.from({ length: 30 }, (_, i) => [
      part({ id: 100 + i, jobId: 100 + i, jobReference: `LJ-27-${100 + i}`, label: `Door ${i}`, handleAt: new Date(now.getTime() + (30 - i) * 60_000).toISOString() }),
      part({ id: 200 + i, jobId: 200 + i, jobReference: `LJ-28-${100 + i}`, ...waiting }),
    ]).flat();
    const summary = summariseForWall(many, now, { ...limits, jobs: 4, next: 3, waiting: 5 });
    expect(summary.jobs).toHaveLength(4);
    expect(summary.jobsInFinish).toBe(30);
    expect(summary.waitingJobs.map((j) => j.jobReference)).toEqual(['LJ-28-100', 'LJ-28-101', 'LJ-28-102', 'LJ-28-103', 'LJ-28-104']);
    expect(summary.waitingJobsCount).toBe(30);
    // Door 29 handles in 1 min, Door 28 in 2, Door 27 in 3.
    expect(summary.nextReady.map((p) => p.label)).toEqual(['Door 29', 'Door 28', 'Door 27']);
    expect(summary.totals).toEqual({ drying: 30, waiting: 30 });
    expect(summary.nextChangeAt).toBe(new Date(now.getTime() + 60_000).toISOString());
  });

  it('is answered for an empty board', () => {
    expect(summariseForWall([], now, limits)).toEqual({ jobs: [], jobsInFinish: 0, waitingJobs: [], waitingJobsCount: 0, nextReady: [], totals: {}, nextChangeAt: null, asOf: now.toISOString() });
  });
});

describe('board order and states', () => {
  it('moves a drying part on at its times and never behind the answer', () => {
    expect(stateAt(part({}), new Date('2026-12-02T10:41:59Z'))).toBe('drying');
    expect(stateAt(part({}), new Date('2026-12-02T10:42:00Z'))).toBe('ready-to-handle');
    expect(stateAt(part({ state: 'ready-to-pack' }), new Date('2026-12-02T09:00:00Z'))).toBe('ready-to-pack');
  });
  it('orders labels with numbers as numbers, and drying parts by handle time', () => {
    const shown = (label: string, handleAt: string | null) => ({ shownState: 'drying' as const, label, handleAt });
    expect([shown('Door 10', null), shown('Door 2', null)].sort(compareForBoard).map((p) => p.label)).toEqual(['Door 2', 'Door 10']);
    expect([shown('A', '2026-12-02T12:00:00Z'), shown('B', '2026-12-02T11:00:00Z')].sort(compareForBoard).map((p) => p.label)).toEqual(['B', 'A']);
  });
});

import { describe, expect, it } from 'vitest';
import { readyPart } from '../../../shared/ready-part-fixture';
import { groupByJob } from '../../../../src/features/ready-board/components/board-groups';
import { stateAt, toBoardPart } from '../../../../src/features/ready-board/components/readiness';
import { coatWords, partLines, timeUntil } from '../../../../src/features/ready-board/components/readiness-words';
import { groupByRack } from '../../../../src/features/ready-board/components/board-groups';
import { jobReadyLines } from '../../../../src/lib/ready-time-words';

const zone = 'Europe/London';
const at = (iso: string) => new Date(iso);

const part = readyPart;

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
  it('says what is next for a part between coats, never a handle time, and a window that closed since the last answer', () => {
    const between = part({
      state: 'in-finish',
      coatsDone: 1,
      coatsRemaining: 2,
      nextStep: 'Denib P400',
      nextStepKind: 'denib',
      nextStepGrit: 'P400',
      abradeRequired: true,
      nextWindowOpensAt: '2026-12-02T11:00:00Z',
      nextWindowClosesAt: '2026-12-02T20:00:00Z',
      handleAt: '2026-12-02T12:00:00Z',
      expectedHandleAt: '2026-12-03T09:15:00Z',
    });
    const now = at('2026-12-02T10:30:00Z');
    const lines = partLines(toBoardPart(between, now), now, zone);
    expect(lines).toEqual({
      headline: 'Denib with P400 needed, then coat 2 of 3',
      details: ['Window opens 11:00 (in 30 min)', 'Can be moved between racks from 12:00', 'Ready to handle from about tomorrow 09:15 (estimate, 2 coats to go)'],
    });
    expect([lines.headline, ...lines.details].join(' ')).not.toMatch(/Handle in/);
    const late = at('2026-12-02T20:00:00Z');
    expect(partLines(toBoardPart(between, late), late, zone)).toMatchObject({ headline: 'Denib with P320 needed, then coat 2 of 3', details: expect.arrayContaining(['Recoat window closed at 20:00']) });
  });
  it('names the next coat once the denib is on record, with a window that no longer closes', () => {
    const denibbed = part({ state: 'in-finish', coatsDone: 1, coatsRemaining: 2, nextStep: 'Coat 2 of 3 at 40 µm dry', nextStepKind: 'coat', nextStepDryFilmUm: 40, nextWindowOpensAt: '2026-12-02T11:00:00Z', denibbedAt: '2026-12-02T11:05:00Z', handleAt: null, expectedHandleAt: null });
    const now = at('2026-12-02T11:10:00Z');
    expect(partLines(toBoardPart(denibbed, now), now, zone)).toEqual({ headline: 'Coat 2 of 3 next', details: ['Denibbed at 11:05', 'Window open, no closing time'] });
    expect(coatWords(toBoardPart(denibbed, now))).toBe('1 of 3 coats on');
  });
  it('says when and where from a collected part was taken, and files it under that rack', () => {
    const gone = toBoardPart(part({ state: 'collected', rack: null, collectedAt: '2026-12-02T10:50:00Z', collectedFrom: { id: 7, name: 'Rack B', shelf: 4 } }), at('2026-12-02T11:00:00Z'));
    expect(partLines(gone, at('2026-12-02T11:00:00Z'), zone)).toEqual({ headline: 'Collected 10:50', details: ['Taken from Rack B, shelf 4'] });
    expect(groupByRack([gone]).map((g) => g.title)).toEqual(['Rack B']);
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
  });});

describe('jobReadyLines', () => {
  const job = { jobId: 5, jobReference: 'LJ-26-105', handleAt: '2026-12-03T09:15:00Z', packAt: '2026-12-03T17:00:00Z', coatsRemaining: 4, partsCounted: 2, partsCollected: 0, partsUnknown: 0, projected: true, dryingTempC: 20 };
  it('gives the whole job’s handle and pack times, and says an estimate is one', () => {
    expect(jobReadyLines(job, at('2026-12-02T10:00:00Z'), zone, 'metric')).toEqual({
      headline: 'Whole job ready to handle from about tomorrow 09:15 (in 23 h 15 min)',
      details: [
        'Whole job ready to pack from about tomorrow 17:00 (in 31 h)',
        '4 coats still to go on. Estimate: each coat as soon as its recoat window opens (or at its booked session), drying at 20.0 °C, the shop’s expected drying temperature.',
      ],
    });
  });
  it('speaks plainly once every coat is on, and when nothing is left or known', () => {
    const done = { ...job, coatsRemaining: 0, projected: false };
    expect(jobReadyLines(done, at('2026-12-03T10:00:00Z'), zone, 'metric').headline).toBe('Whole job ready to handle since 09:15');
    expect(jobReadyLines(done, at('2026-12-03T08:00:00Z'), zone, 'metric').headline).toBe('Whole job ready to handle at 09:15 (in 1 h 15 min)');
    expect(jobReadyLines({ ...job, partsCounted: 0, partsCollected: 3 }, at('2026-12-03T08:00:00Z'), zone, 'metric').headline).toBe('Every part has been collected');
    expect(jobReadyLines({ ...job, partsUnknown: 1, handleAt: null }, at('2026-12-03T08:00:00Z'), zone, 'metric').headline).toBe('Ready time not known yet');
  });
});

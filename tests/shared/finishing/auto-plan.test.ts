import { describe, expect, it } from 'vitest';
import { autoPlan, type PlanInput, type PlanJob } from '../../../shared/finishing/auto-plan';

// A hand-made scenario: one booth open Monday–Friday 07:00–17:00 in UTC (no clock change in
// January), 24 m²/h, 15 min set-up and 20 min clean-down; a primer and a topcoat whose data
// sheet rows are at the planning temperature (20 °C), so no temperature scaling applies.
const row = (recoatMinMin: number, recoatMaxMin: number | null) => ({ tempC: 20, flashOffMin: 10, recoatMinMin, recoatMaxMin, touchDryMin: 30, handleMin: 120, packMin: 480, fullCureH: 168 });
const weekdays = [1, 2, 3, 4, 5].map((weekday) => ({ weekday, opens: '07:00', closes: '17:00' }));

const job = (overrides: Partial<PlanJob> = {}): PlanJob => ({
  id: 1,
  reference: 'J1',
  dueDate: '2027-01-08',
  partIds: [1, 2],
  areaM2: 12,
  footprintM2: 4,
  remaining: [
    { position: 0, kind: 'coat', productName: 'Primer', dryingTimes: [row(120, 1440)] },
    { position: 1, kind: 'abrade', grit: 'P320' },
    { position: 2, kind: 'coat', productName: 'Topcoat', dryingTimes: [row(180, null)] },
  ],
  lastWindow: null,
  ...overrides,
});

const input = (overrides: Partial<PlanInput> = {}): PlanInput => ({
  now: new Date('2027-01-04T08:00:00Z'), // a Monday
  horizonDays: 14,
  timeZone: 'UTC',
  planningTempC: 20,
  setupMin: 15,
  cleanDownMin: 20,
  abradeMin: 30,
  booths: [{ id: 7, name: 'B', openingHours: weekdays, sprayRateM2PerH: 24 }],
  busy: [],
  rackCapacityM2: 100,
  rackLoad: [],
  jobs: [job()],
  ...overrides,
});

describe('autoPlan', () => {
  it('places each coat after the previous recoat window opens and a denib, as early as possible', () => {
    const plan = autoPlan(input());
    // Session length: 12 m² / 24 m²/h = 30 min + 15 + 20 = 65 → 65 min (already a multiple of 5).
    expect(plan.sessions.map((s) => [s.start.toISOString(), s.end.toISOString()])).toEqual([
      ['2027-01-04T08:00:00.000Z', '2027-01-04T09:05:00.000Z'],
      // Primer ends 09:05; recoat opens 120 min later at 11:05; denib 30 min → 11:35; next 15-minute slot 11:45.
      ['2027-01-04T11:45:00.000Z', '2027-01-04T12:50:00.000Z'],
    ]);
    // Topcoat ends 12:50; pack 480 min later = 20:50 on the 4th, before the 8 January due date.
    expect(plan.jobs[0]).toMatchObject({ dueDateMet: true, finishesAt: new Date('2027-01-04T20:50:00Z') });
  });

  it('works around booked time and opening hours', () => {
    const plan = autoPlan(input({ now: new Date('2027-01-08T16:00:00Z'), busy: [] }));
    // Friday 16:00 + 65 min runs past 17:00, so the first coat goes on Monday 11 January at 07:00.
    expect(plan.sessions[0].start.toISOString()).toBe('2027-01-11T07:00:00.000Z');
    const booked = autoPlan(input({ busy: [{ boothId: 7, start: new Date('2027-01-04T08:00:00Z'), end: new Date('2027-01-04T10:00:00Z') }] }));
    expect(booked.sessions[0].start.toISOString()).toBe('2027-01-04T10:00:00.000Z');
  });

  it('waits for rack space until the parts can be handled', () => {
    const full = [{ from: new Date('2027-01-04T00:00:00Z'), until: new Date('2027-01-04T13:00:00Z'), areaM2: 98 }];
    const plan = autoPlan(input({ rackLoad: full }));
    // The primer's parts need 4 m² of shelf from the session's end until handling (120 min);
    // only 2 m² are free until 13:00, so the first session may end no earlier than 13:00.
    expect(plan.sessions[0].end.getTime()).toBeGreaterThanOrEqual(new Date('2027-01-04T13:00:00Z').getTime());
  });

  it('says in words when a due date is missed and when a step cannot fit', () => {
    const late = autoPlan(input({ jobs: [job({ dueDate: '2027-01-03' })] }));
    expect(late.jobs[0].dueDateMet).toBe(false);
    expect(late.jobs[0].notes.join(' ')).toMatch(/after the due date 2027-01-03/);
    const closed = autoPlan(input({ booths: [{ id: 7, name: 'B', openingHours: [{ weekday: 6, opens: '07:00', closes: '07:30' }], sprayRateM2PerH: 24 }] }));
    expect(closed.sessions).toHaveLength(0);
    expect(closed.jobs[0].notes[0]).toMatch(/no free booth time/);
  });

  it('plans jobs by due date, earliest first', () => {
    const plan = autoPlan(input({ jobs: [job({ id: 1, reference: 'Later', dueDate: '2027-01-20' }), job({ id: 2, reference: 'Sooner', dueDate: '2027-01-06' })] }));
    expect(plan.sessions[0].jobId).toBe(2);
  });
});

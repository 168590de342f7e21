import { describe, expect, it } from 'vitest';
import { autoPlan, type PlanInput, type PlanJob, type PlanPart, type PlanStep, type RecordedCoat } from '../../../shared/finishing/auto-plan';

// A hand-made scenario: one booth open Monday–Friday 07:00–17:00 in UTC (no clock change in
// January), 24 m²/h, 15 min set-up and 20 min clean-down; a primer and a topcoat whose data
// sheet rows are at the planning temperature (20 °C), so no temperature scaling applies. Every
// expected time below is worked by hand from these figures.
const row = (recoatMinMin: number, recoatMaxMin: number | null) => ({ tempC: 20, flashOffMin: 10, recoatMinMin, recoatMaxMin, touchDryMin: 30, handleMin: 120, packMin: 480, fullCureH: 168 });
const weekdays = [1, 2, 3, 4, 5].map((weekday) => ({ weekday, opens: '07:00', closes: '17:00' }));
const at = (iso: string) => new Date(iso);

const primer: PlanStep = { position: 0, kind: 'coat', productName: 'Primer', dryingTimes: [row(120, 1440)] };
const denib: PlanStep = { position: 1, kind: 'abrade', grit: 'P320' };
const topcoat: PlanStep = { position: 2, kind: 'coat', productName: 'Topcoat', dryingTimes: [row(180, null)] };

// Two parts of 6 m² each (12 m² a coat), 2 m² of shelf each.
const part = (id: number, coats: RecordedCoat[] = []): PlanPart => ({ id, areaM2: 6, footprintM2: 2, coats });
const primerOnRecord = (opens: string, closes: string | null): RecordedCoat => ({ stepPosition: 0, recoatOpensAt: at(opens), recoatClosesAt: closes ? at(closes) : null, packAt: at('2027-01-04T16:00:00Z') });

const job = (overrides: Partial<PlanJob> = {}): PlanJob => ({
  id: 1,
  reference: 'J1',
  dueDate: '2027-01-08',
  steps: [primer, denib, topcoat],
  parts: [part(1), part(2)],
  booked: [],
  ...overrides,
});

const input = (overrides: Partial<PlanInput> = {}): PlanInput => ({
  now: at('2027-01-04T08:00:00Z'), // a Monday
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

const slots = (plan: ReturnType<typeof autoPlan>) => plan.sessions.map((s) => [s.stepPosition, s.start.toISOString(), s.end.toISOString()]);

describe('autoPlan', () => {
  it('places each coat after the previous recoat window opens and a denib, as early as possible', () => {
    const plan = autoPlan(input());
    // Session length: 12 m² / 24 m²/h = 30 min + 15 + 20 = 65 → 65 min (already a multiple of 5).
    expect(slots(plan)).toEqual([
      [0, '2027-01-04T08:00:00.000Z', '2027-01-04T09:05:00.000Z'],
      // Primer ends 09:05; recoat opens 120 min later at 11:05; denib 30 min → 11:35; next 15-minute slot 11:45.
      [2, '2027-01-04T11:45:00.000Z', '2027-01-04T12:50:00.000Z'],
    ]);
    // Topcoat ends 12:50; pack 480 min later = 20:50 on the 4th, before the 8 January due date.
    expect(plan.jobs[0]).toMatchObject({ dueDateMet: true, finishesAt: at('2027-01-04T20:50:00Z') });
  });

  it('numbers each planned coat among the coat steps and names the denib due before it', () => {
    const fine: PlanStep = { position: 1, kind: 'abrade', grit: 'P400' };
    const sessions = autoPlan(input({ jobs: [job({ steps: [primer, fine, topcoat] })] })).sessions;
    expect(sessions.map((s) => [s.coatNumber, s.coatsTotal, s.denibBeforeGrit])).toEqual([
      [1, 2, null],
      [2, 2, 'P400'],
    ]);
  });

  it('works around booked time and opening hours', () => {
    const plan = autoPlan(input({ now: at('2027-01-08T16:00:00Z'), busy: [] }));
    // Friday 16:00 + 65 min runs past 17:00, so the first coat goes on Monday 11 January at 07:00.
    expect(plan.sessions[0].start.toISOString()).toBe('2027-01-11T07:00:00.000Z');
    const booked = autoPlan(input({ busy: [{ boothId: 7, start: at('2027-01-04T08:00:00Z'), end: at('2027-01-04T10:00:00Z') }] }));
    expect(booked.sessions[0].start.toISOString()).toBe('2027-01-04T10:00:00.000Z');
  });

  it('waits for rack space until the parts can be handled', () => {
    const full = [{ from: at('2027-01-04T00:00:00Z'), until: at('2027-01-04T13:00:00Z'), areaM2: 98 }];
    const plan = autoPlan(input({ rackLoad: full }));
    // The primer's parts need 4 m² of shelf from the session's end until handling (120 min);
    // only 2 m² are free until 13:00, so the first session may end no earlier than 13:00.
    expect(plan.sessions[0].end.getTime()).toBeGreaterThanOrEqual(at('2027-01-04T13:00:00Z').getTime());
  });

  it('says in words when a due date is missed and when a step cannot fit', () => {
    const late = autoPlan(input({ jobs: [job({ dueDate: '2027-01-03' })] }));
    expect(late.jobs[0].dueDateMet).toBe(false);
    expect(late.jobs[0].notes.join(' ')).toMatch(/after the due date Sun, 3 Jan 2027/);
    const closed = autoPlan(input({ booths: [{ id: 7, name: 'B', openingHours: [{ weekday: 6, opens: '07:00', closes: '07:30' }], sprayRateM2PerH: 24 }] }));
    expect(closed.sessions).toHaveLength(0);
    expect(closed.jobs[0].notes[0]).toMatch(/no free booth time/);
  });

  it('plans jobs by due date, earliest first', () => {
    const plan = autoPlan(input({ jobs: [job({ id: 1, reference: 'Later', dueDate: '2027-01-20' }), job({ id: 2, reference: 'Sooner', dueDate: '2027-01-06' })] }));
    expect(plan.sessions[0].jobId).toBe(2);
  });
});

describe('autoPlan, starting from what is on record and booked', () => {
  it('does not plan a coat the parts already have, and plans the next one from its recorded window', () => {
    const sprayed = [part(1, [primerOnRecord('2027-01-04T10:00:00Z', '2027-01-05T10:00:00Z')]), part(2, [primerOnRecord('2027-01-04T10:00:00Z', '2027-01-05T10:00:00Z')])];
    const plan = autoPlan(input({ jobs: [job({ parts: sprayed })] }));
    // Recoat opens 10:00 on record; the denib takes 30 min → 10:30, a slot boundary; 65 min → 11:35.
    expect(slots(plan)).toEqual([[2, '2027-01-04T10:30:00.000Z', '2027-01-04T11:35:00.000Z']]);
    // Pack 480 min after 11:35 = 19:35.
    expect(plan.jobs[0].finishesAt).toEqual(at('2027-01-04T19:35:00Z'));
  });

  it('does not propose a step booked in a live session again, and plans the next coat after that session’s window', () => {
    const booked = [{ stepPosition: 0, start: at('2027-01-04T13:00:00Z'), end: at('2027-01-04T14:05:00Z'), partIds: [1, 2] }];
    const busy = [{ boothId: 7, start: booked[0].start, end: booked[0].end }];
    const plan = autoPlan(input({ busy, jobs: [job({ booked })] }));
    // The booked primer ends 14:05; its window opens 120 min later at 16:05, the denib makes it 16:35,
    // and 16:35 + 65 min runs past the 17:00 close, so the topcoat goes first thing Tuesday, 07:00–08:05.
    expect(slots(plan)).toEqual([[2, '2027-01-05T07:00:00.000Z', '2027-01-05T08:05:00.000Z']]);
    expect(plan.jobs[0].notes[0]).toBe('Coat 1 of 2 (Primer) is already booked Mon 4 Jan, 13:00; not proposed again.');
    // Pack 480 min after Tuesday 08:05 = 16:05.
    expect(plan.jobs[0].finishesAt).toEqual(at('2027-01-05T16:05:00Z'));
  });

  it('plans a step only for the parts that still need it, and the next coat when the last of them can take it', () => {
    const plan = autoPlan(input({ jobs: [job({ parts: [part(1, [primerOnRecord('2027-01-04T10:00:00Z', '2027-01-05T10:00:00Z')]), part(2)] })] }));
    // Primer for part 2 alone: 6 m² / 24 m²/h = 15 min + 35 = 50 min, 08:00–08:50.
    expect(plan.sessions[0]).toMatchObject({ stepPosition: 0, partIds: [2], areaM2: 6 });
    expect(plan.sessions[0].end).toEqual(at('2027-01-04T08:50:00Z'));
    // Topcoat for both: part 1 may take it from 10:00, part 2 from 08:50 + 120 min = 10:50; the denib
    // makes it 11:20 and the next slot is 11:30; 12 m² → 65 min.
    expect(slots(plan)[1]).toEqual([2, '2027-01-04T11:30:00.000Z', '2027-01-04T12:35:00.000Z']);
    expect(plan.sessions[1].partIds).toEqual([1, 2]);
  });

  it('ignores a booking whose parts are all sprayed already', () => {
    const sprayed = [part(1, [primerOnRecord('2027-01-04T10:00:00Z', null)]), part(2, [primerOnRecord('2027-01-04T10:00:00Z', null)])];
    const spent = [{ stepPosition: 0, start: at('2027-01-04T07:00:00Z'), end: at('2027-01-04T09:00:00Z'), partIds: [1, 2] }];
    const plan = autoPlan(input({ jobs: [job({ parts: sprayed, booked: spent })] }));
    expect(plan.jobs[0].notes.join(' ')).not.toMatch(/already booked/);
    expect(slots(plan)).toEqual([[2, '2027-01-04T10:30:00.000Z', '2027-01-04T11:35:00.000Z']]);
  });

  it('adds a denib when the recorded coat’s recoat window has already closed', () => {
    const missed = primerOnRecord('2027-01-03T12:00:00Z', '2027-01-04T07:00:00Z');
    const plan = autoPlan(input({ jobs: [job({ steps: [primer, topcoat], parts: [part(1, [missed]), part(2, [missed])] })] }));
    // The first free slot (08:00) is after the 07:00 close, so the 30 min denib comes first: 08:30.
    expect(slots(plan)).toEqual([[2, '2027-01-04T08:30:00.000Z', '2027-01-04T09:35:00.000Z']]);
    expect(plan.sessions[0]).toMatchObject({ coatNumber: 2, coatsTotal: 2, denibBeforeGrit: 'P320' });
    expect(plan.jobs[0].notes[0]).toMatch(/^Coat 2 of 2 \(Topcoat\): no booth time before the recoat window closes \(Mon 4 Jan, 07:00\); the plan adds a denib with P320 first/);
  });

  it('reads the job’s finish from its bookings when every remaining coat is booked', () => {
    const booked = [
      { stepPosition: 0, start: at('2027-01-04T08:00:00Z'), end: at('2027-01-04T09:05:00Z'), partIds: [1, 2] },
      { stepPosition: 2, start: at('2027-01-04T12:00:00Z'), end: at('2027-01-04T13:05:00Z'), partIds: [1, 2] },
    ];
    const plan = autoPlan(input({ jobs: [job({ booked })] }));
    expect(plan.sessions).toHaveLength(0);
    // Pack 480 min after the booked topcoat ends at 13:05 = 21:05.
    expect(plan.jobs[0]).toMatchObject({ finishesAt: at('2027-01-04T21:05:00Z'), dueDateMet: true });
  });

  it('says when a booked coat starts before the previous coat’s recoat window opens', () => {
    const booked = [
      { stepPosition: 0, start: at('2027-01-04T08:00:00Z'), end: at('2027-01-04T09:05:00Z'), partIds: [1, 2] },
      // 09:30 is before the primer's window opens at 11:05.
      { stepPosition: 2, start: at('2027-01-04T09:30:00Z'), end: at('2027-01-04T10:35:00Z'), partIds: [1, 2] },
    ];
    const plan = autoPlan(input({ jobs: [job({ booked })] }));
    expect(plan.jobs[0].notes).toContain('That session starts before the previous coat’s recoat window opens (Mon 4 Jan, 11:05).');
  });
});

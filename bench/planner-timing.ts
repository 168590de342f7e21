import { TZDate } from '@date-fns/tz';
import { autoPlan, type PlanInput, type PlanJob, type PlanStep } from '../shared/finishing/auto-plan';
import type { DryingRow } from '../shared/finishing/drying-row-schema';
import { defaultOpeningHours } from '../shared/schemas/booth';
import { demoProducts } from '../server/db/demo-products';

export interface PlannerTiming {
  medianMs: number;
  runs: number;
  parts: number;
  sessionsPlanned: number;
  jobsOnTime: number;
  jobs: number;
}

const dryingOf = (name: string): DryingRow[] => {
  const product = demoProducts.find((p) => p.name === name);
  if (!product) throw new Error(`demo product ${name} is missing`);
  return product.dryingTimes as DryingRow[];
};

/** 50 jobs of 10 parts, each needing primer, denib and two topcoats: 500 parts × 3 coats. */
function plannerInput(): PlanInput {
  const primer = dryingOf('Kestrel 2K PU Primer White');
  const topcoat = dryingOf('Kestrel 2K PU Topcoat Satin');
  const steps: PlanStep[] = [
    { position: 0, kind: 'coat', productName: 'Primer', dryingTimes: primer },
    { position: 1, kind: 'abrade', grit: 'P320' },
    { position: 2, kind: 'coat', productName: 'Topcoat', dryingTimes: topcoat },
    { position: 3, kind: 'coat', productName: 'Topcoat', dryingTimes: topcoat },
  ];
  // A fixed Monday morning, so every run plans the same fortnight.
  const now = new TZDate(2027, 0, 4, 7, 0, 0, 'Europe/London');
  const jobs = Array.from({ length: 50 }, (_, j): PlanJob => ({
    id: j + 1,
    reference: `PLAN-${j + 1}`,
    dueDate: new Date(now.getTime() + (4 + (j % 10)) * 86_400_000).toISOString().slice(0, 10),
    parts: Array.from({ length: 10 }, (_, i) => ({ id: j * 10 + i + 1, areaM2: (7 + (j % 5)) / 10, footprintM2: (2.5 + (j % 3) * 0.5) / 10, coats: [] })),
    steps,
    booked: [],
  }));
  return {
    now: new Date(now.getTime()),
    horizonDays: 14,
    timeZone: 'Europe/London',
    planningTempC: 20,
    setupMin: 15,
    cleanDownMin: 20,
    abradeMin: 30,
    booths: [
      { id: 1, name: 'Booth 1', openingHours: defaultOpeningHours, sprayRateM2PerH: 24 },
      { id: 2, name: 'Back spray room', openingHours: defaultOpeningHours, sprayRateM2PerH: 14 },
    ],
    // Two sessions already booked on the first morning.
    busy: [
      { boothId: 1, start: new Date(now.getTime() + 60 * 60_000), end: new Date(now.getTime() + 180 * 60_000) },
      { boothId: 2, start: new Date(now.getTime() + 120 * 60_000), end: new Date(now.getTime() + 240 * 60_000) },
    ],
    rackCapacityM2: 56,
    rackLoad: [],
    jobs,
  };
}

/** Times autoPlan (a pure function) over several runs and gives the median. */
export function timePlanner(runs = 5): PlannerTiming {
  const input = plannerInput();
  const times: number[] = [];
  let plan = autoPlan(input); // warm-up
  for (let i = 0; i < runs; i += 1) {
    const started = performance.now();
    plan = autoPlan(input);
    times.push(performance.now() - started);
  }
  times.sort((a, b) => a - b);
  return {
    medianMs: times[Math.floor(runs / 2)],
    runs,
    parts: input.jobs.reduce((n, j) => n + j.parts.length, 0),
    sessionsPlanned: plan.sessions.length,
    jobsOnTime: plan.jobs.filter((j) => j.dueDateMet).length,
    jobs: input.jobs.length,
  };
}

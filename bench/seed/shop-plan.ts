import type { ShopRefs } from './base-shop';
import { seededRandom, type Timeline } from './timeline';

/**
 * How the synthetic shop works, in numbers. Every working day one job starts per bench finish
 * system; each job is 20 parts; each coat step of a job is one spray session the working day
 * after the previous step; each part gets one coat record per step. With two four-coat and two
 * six-coat systems that is 20 sessions a day over three booths and 400 coat records a day:
 * 52 weeks make about 104,000 coats, 5,200 sessions and 21,000 parts.
 *
 * Ids follow time over the whole ten-year timeline (a day's rows sit in a fixed block of ids),
 * so the one-year database can later be grown backwards to ten years with older, lower ids.
 */
export const partsPerJob = 20;
export const coatIdsPerSession = partsPerJob + 1; // one spare id for a correction
export const readingMinutes = { boothEvery: 10, rackEvery: 60, opensMin: 7 * 60, closesMin: 17 * 60 } as const;

export interface JobStep {
  /** Jobs are numbered by start day and system: seq = startDay × systems + system. */
  jobSeq: number;
  system: number;
  /** Which coat of the system (0-based, abrade steps not counted). */
  coat: number;
}

export interface SessionSlot extends JobStep {
  slot: number;
  boothId: number;
  sprayer: { id: number; name: string };
  startMs: number;
  endMs: number;
}

export const sessionsPerDay = (refs: ShopRefs) => refs.systems.reduce((sum, s) => sum + s.coats.length, 0);
export const jobsPerDay = (refs: ShopRefs) => refs.systems.length;
export const heatedRacks = (refs: ShopRefs) => refs.racks.filter((r) => r.dryingTempC !== null);
export const readingsPerDay = (refs: ShopRefs) =>
  ((readingMinutes.closesMin - readingMinutes.opensMin) / readingMinutes.boothEvery) * refs.boothIds.length +
  ((readingMinutes.closesMin - readingMinutes.opensMin) / readingMinutes.rackEvery) * heatedRacks(refs).length;

/** The coat steps due on working day `day`: coat k of every job that started k working days before. */
function jobStepsOn(day: number, refs: ShopRefs): JobStep[] {
  const steps: JobStep[] = [];
  refs.systems.forEach((system, index) => {
    for (let coat = 0; coat < system.coats.length; coat += 1) {
      if (day - coat >= 0) steps.push({ jobSeq: (day - coat) * refs.systems.length + index, system: index, coat });
    }
  });
  return steps;
}

function shuffle<T>(items: T[], random: () => number): T[] {
  for (let i = items.length - 1; i > 0; i -= 1) {
    const j = Math.floor(random() * (i + 1));
    [items[i], items[j]] = [items[j], items[i]];
  }
  return items;
}

/** The day's sessions: shuffled over the booths, back to back from 07:15 inside 07:00–17:00. */
export function sessionsOn(day: number, timeline: Timeline, refs: ShopRefs): SessionSlot[] {
  const random = seededRandom(day * 7919 + 17);
  const steps = shuffle(jobStepsOn(day, refs), random);
  const midnight = timeline.days[day].midnightMs;
  return steps.map((step, slot) => {
    const booth = slot % refs.boothIds.length;
    const order = Math.floor(slot / refs.boothIds.length);
    const startMin = 7 * 60 + 15 + order * 80 + Math.floor(random() * 8);
    const lengthMin = 50 + Math.floor(random() * 20);
    const startMs = midnight + startMin * 60_000;
    return { ...step, slot, boothId: refs.boothIds[booth], sprayer: refs.sprayers[booth % refs.sprayers.length], startMs, endMs: startMs + lengthMin * 60_000 };
  });
}

/** The working day a job's last coat goes on, and whether its parts have been collected by now. */
export function jobProgress(jobSeq: number, timeline: Timeline, refs: ShopRefs) {
  const startDay = Math.floor(jobSeq / refs.systems.length);
  const coats = refs.systems[jobSeq % refs.systems.length].coats.length;
  const lastCoatDay = startDay + coats - 1;
  const coatsDone = Math.max(0, Math.min(coats, timeline.todayIndex - startDay));
  const collectedDay = lastCoatDay + 2;
  const collected = collectedDay < timeline.todayIndex;
  return { startDay, coats, lastCoatDay, coatsDone, collected, collectedDay };
}

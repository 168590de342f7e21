import { compareForBoard, countStates, type BoardPart, type StateCounts } from './readiness';

export interface WallJob {
  jobId: number;
  reference: string;
  customer: string;
  counts: StateCounts;
  /** Higher is more for the assembler to do now; orders the cards. */
  urgency: number;
}

export interface WallSummary {
  activeJobs: WallJob[];
  /** Jobs with no coat on any part yet, named in one line instead of a card each. */
  waitingJobs: { reference: string; parts: number }[];
  nextReady: BoardPart[];
}

function urgencyOf(counts: StateCounts): number {
  const n = (state: keyof StateCounts) => counts[state] ?? 0;
  return (n('ready-to-handle') + n('ready-to-pack') + n('cured')) * 1000 + n('drying') * 10 + n('in-finish');
}

/** What the wall shows: jobs with parts still to collect, busiest first, and the parts that will be ready soonest. */
export function summariseForWall(parts: readonly BoardPart[], nextCount: number): WallSummary {
  const byJob = new Map<number, BoardPart[]>();
  for (const part of parts) byJob.set(part.jobId, [...(byJob.get(part.jobId) ?? []), part]);
  const activeJobs: WallJob[] = [];
  const waitingJobs: WallSummary['waitingJobs'] = [];
  for (const [jobId, jobParts] of byJob) {
    const counts = countStates(jobParts);
    const left = jobParts.length - (counts.collected ?? 0);
    if (left === 0) continue;
    if ((counts.waiting ?? 0) === left) waitingJobs.push({ reference: jobParts[0].jobReference, parts: left });
    else activeJobs.push({ jobId, reference: jobParts[0].jobReference, customer: jobParts[0].customer, counts, urgency: urgencyOf(counts) });
  }
  activeJobs.sort((a, b) => b.urgency - a.urgency || a.reference.localeCompare(b.reference, 'en-GB', { numeric: true }));
  const nextReady = parts.filter((part) => part.shownState === 'drying').sort(compareForBoard).slice(0, nextCount);
  return { activeJobs, waitingJobs, nextReady };
}

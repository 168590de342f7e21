import { jobStates, liveJobStates, type Job, type JobState } from '../../../../shared/schemas/job';

export const jobStateLabels: Record<JobState, string> = {
  open: 'Open',
  'in-finish': 'In finish',
  ready: 'Ready',
  delivered: 'Delivered',
  cancelled: 'Cancelled',
};

/** What each state means, for the state filter and the job form. */
const jobStateHints: Record<JobState, string> = {
  open: 'No coat yet',
  'in-finish': 'Coats going on or drying',
  ready: 'Every part can be handled',
  delivered: 'Every part collected',
  cancelled: 'Set by a lead',
};

export const jobStateOptions = jobStates.map((state) => ({ value: state, label: jobStateLabels[state] }));

/** The list filter: one state, or every job not yet delivered or cancelled. */
export type JobStateFilter = JobState | 'active' | '';
export const jobStateFilterOptions: { value: JobStateFilter; label: string }[] = [
  { value: '', label: 'Any state' },
  { value: 'active', label: 'Not delivered yet (open, in finish, ready)' },
  ...jobStates.map((state) => ({ value: state, label: `${jobStateLabels[state]}${state === 'delivered' ? ' (closed)' : ''}: ${jobStateHints[state].toLowerCase()}` })),
];

const dayMs = 86_400_000;
const toUtcDay = (isoDate: string) => Date.parse(`${isoDate}T00:00:00Z`);

/** "Thu 12 Mar 2026": a calendar date, so it is formatted as UTC to keep the day it names. */
export function formatDueDate(isoDate: string): string {
  const at = toUtcDay(isoDate);
  if (Number.isNaN(at)) return isoDate;
  return new Intl.DateTimeFormat('en-GB', { timeZone: 'UTC', weekday: 'short', day: 'numeric', month: 'short', year: 'numeric' }).format(at);
}

interface DueWords {
  date: string;
  relation: string;
  overdue: boolean;
}

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/** The due date and how it stands against the shop's today; delivered and cancelled jobs cannot be late. */
export function dueWords(job: Pick<Job, 'dueDate' | 'state'>, shopToday: string): DueWords {
  const days = Math.round((toUtcDay(job.dueDate) - toUtcDay(shopToday)) / dayMs);
  const date = formatDueDate(job.dueDate);
  const live = liveJobStates.includes(job.state);
  if (!live || Number.isNaN(days)) return { date, relation: '', overdue: false };
  if (days < 0) return { date, relation: `Overdue by ${plural(-days, 'day')}`, overdue: true };
  if (days === 0) return { date, relation: 'Due today', overdue: false };
  if (days === 1) return { date, relation: 'Due tomorrow', overdue: false };
  return { date, relation: `Due in ${plural(days, 'day')}`, overdue: false };
}

export function colourAndSheen(job: Pick<Job, 'colour' | 'sheen'>): string {
  return [job.colour, job.sheen].filter(Boolean).join(' · ') || 'No colour or sheen given';
}

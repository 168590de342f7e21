import { dueStatusLabels } from '../../../../shared/schemas/upkeep';
import type { StatusTone } from '../../../components/ui/status-badge';

type DueStatus = keyof typeof dueStatusLabels;

export const crewTone: Record<DueStatus, StatusTone> = { valid: 'go', 'due-soon': 'caution', lapsed: 'stop', none: 'quiet' };
export const crewLabel = (status: DueStatus) => dueStatusLabels[status];

/** A calendar date (YYYY-MM-DD) in words; a shop day already, so no zone can move it. */
export function dayWords(date: string | null): string {
  if (!date) return 'not set';
  return new Intl.DateTimeFormat('en-GB', { timeZone: 'UTC', day: 'numeric', month: 'short', year: 'numeric' }).format(new Date(`${date}T00:00:00Z`));
}

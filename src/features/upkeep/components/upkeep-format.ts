import { dueStatusLabels, filterStatusLabels, type FilterBank } from '../../../../shared/schemas/upkeep';
import type { StatusTone } from '../../../components/ui/status-badge';

type DueStatus = keyof typeof dueStatusLabels;

/** A calendar date (YYYY-MM-DD) in words; it is a shop day already, so no zone can move it. */
export function dayWords(date: string | null): string {
  if (!date) return 'not set';
  return new Intl.DateTimeFormat('en-GB', { timeZone: 'UTC', day: 'numeric', month: 'short', year: 'numeric' }).format(new Date(`${date}T00:00:00Z`));
}

export const dueTone: Record<DueStatus, StatusTone> = { valid: 'go', 'due-soon': 'caution', lapsed: 'stop', none: 'quiet' };
export const dueLabel = (status: DueStatus) => dueStatusLabels[status];

export const filterTone: Record<FilterBank['status'], StatusTone> = { ok: 'go', 'near-limit': 'caution', 'over-limit': 'stop', 'no-reading': 'quiet' };
export const filterLabel = (status: FilterBank['status']) => filterStatusLabels[status];

export const pascals = (pa: number | null) => (pa === null ? '—' : `${Math.round(pa)} Pa`);
export const speed = (mps: number) => `${mps.toFixed(2)} m/s`;

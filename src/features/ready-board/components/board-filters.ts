import { useCallback } from 'react';
import { useSearchParams } from 'react-router-dom';
import { readinessStates, type ReadinessState } from '../../../../shared/finishing/readiness';
import type { GroupBy } from './board-groups';
import type { BoardPart } from './readiness';

/** '' hides collected parts (the usual view); 'any' shows every state. */
export type StateFilter = '' | 'any' | ReadinessState;

export interface BoardFilters {
  jobId?: number;
  rackId?: number;
  state: StateFilter;
  group: GroupBy;
}

const positiveId = (value: string | null) => {
  const id = Number(value);
  return Number.isInteger(id) && id > 0 ? id : undefined;
};

function parseState(value: string | null): StateFilter {
  if (value === 'any') return 'any';
  return readinessStates.find((state) => state === value) ?? '';
}

/** The filters live in the address (?job=5&rack=2&state=drying&group=rack), so a board can be bookmarked or shared. */
export function useBoardFilters(): [BoardFilters, (next: BoardFilters) => void] {
  const [params, setParams] = useSearchParams();
  const filters: BoardFilters = {
    jobId: positiveId(params.get('job')),
    rackId: positiveId(params.get('rack')),
    state: parseState(params.get('state')),
    group: params.get('group') === 'rack' ? 'rack' : 'job',
  };
  const setFilters = useCallback(
    (next: BoardFilters) => {
      const search = new URLSearchParams();
      if (next.jobId) search.set('job', String(next.jobId));
      if (next.rackId) search.set('rack', String(next.rackId));
      if (next.state) search.set('state', next.state);
      if (next.group === 'rack') search.set('group', 'rack');
      setParams(search, { replace: true });
    },
    [setParams],
  );
  return [filters, setFilters];
}

export function matchesState(filter: StateFilter): (part: BoardPart) => boolean {
  if (filter === 'any') return () => true;
  if (filter === '') return (part) => part.shownState !== 'collected';
  return (part) => part.shownState === filter;
}

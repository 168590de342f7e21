/** A job's parts, or several parts by id (a spray session's planned parts). */
type PartListFilters = { jobId: number } | { ids: number[] };

export const partKeys = {
  all: ['parts'] as const,
  lists: () => [...partKeys.all, 'list'] as const,
  list: (filters: PartListFilters) => [...partKeys.lists(), filters] as const,
  details: () => [...partKeys.all, 'detail'] as const,
  detail: (id: number) => [...partKeys.details(), id] as const,
  byTag: (tag: string) => [...partKeys.all, 'tag', tag] as const,
  histories: () => [...partKeys.all, 'history'] as const,
  history: (id: number) => [...partKeys.histories(), id] as const,
};

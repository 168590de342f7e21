export const partKeys = {
  all: ['parts'] as const,
  lists: () => [...partKeys.all, 'list'] as const,
  list: (jobId: number) => [...partKeys.lists(), { jobId }] as const,
  details: () => [...partKeys.all, 'detail'] as const,
  detail: (id: number) => [...partKeys.details(), id] as const,
  byTag: (tag: string) => [...partKeys.all, 'tag', tag] as const,
  history: (id: number) => [...partKeys.all, 'history', id] as const,
};

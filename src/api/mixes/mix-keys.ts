export const mixKeys = {
  all: ['mixes'] as const,
  lists: () => [...mixKeys.all, 'list'] as const,
  list: (spraySessionId: number) => [...mixKeys.lists(), { spraySessionId }] as const,
};

export const crewKeys = {
  all: ['crew'] as const,
  list: (siteId: number | undefined) => [...crewKeys.all, 'list', siteId ?? 'all'] as const,
  person: (userId: number) => [...crewKeys.all, 'person', userId] as const,
};

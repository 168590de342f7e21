/** Crew protection records: everyone's status (of one site or all the caller sees), and one person's detail. */
export const crewKeys = {
  all: ['crew'] as const,
  lists: () => [...crewKeys.all, 'list'] as const,
  list: (siteId: number | undefined) => [...crewKeys.lists(), siteId ?? 'all'] as const,
  people: () => [...crewKeys.all, 'person'] as const,
  person: (userId: number) => [...crewKeys.people(), userId] as const,
};

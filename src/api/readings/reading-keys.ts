/** Readings of one booth or one rack, newest first. */
export interface ReadingFilters {
  boothId?: number;
  rackId?: number;
  pageSize?: number;
}

export const readingKeys = {
  all: ['readings'] as const,
  lists: () => [...readingKeys.all, 'list'] as const,
  list: (filters: ReadingFilters) => [...readingKeys.lists(), filters] as const,
};

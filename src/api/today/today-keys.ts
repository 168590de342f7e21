/** Keys for the day's board; an admin looking at one site has its own entry. */
export const todayKeys = {
  all: ['today'] as const,
  board: (siteId?: number) => [...todayKeys.all, 'board', siteId ?? 'every-site'] as const,
};

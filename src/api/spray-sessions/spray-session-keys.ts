import type { SpraySessionQuery } from '../../../shared/schemas/spray-session';

/** Sessions overlapping `from`–`to`, of one booth or every booth the user sees (an admin may name a site). */
export type SpraySessionFilters = Partial<SpraySessionQuery>;

export const spraySessionKeys = {
  all: ['spray-sessions'] as const,
  lists: () => [...spraySessionKeys.all, 'list'] as const,
  list: (filters: SpraySessionFilters) => [...spraySessionKeys.lists(), filters] as const,
  details: () => [...spraySessionKeys.all, 'detail'] as const,
  detail: (id: number) => [...spraySessionKeys.details(), id] as const,
  /** Whether the booth and the sprayer are fit to spray the session: upkeep and crew records move it too. */
  fitnesses: () => [...spraySessionKeys.all, 'fitness'] as const,
  fitness: (id: number) => [...spraySessionKeys.fitnesses(), id] as const,
};

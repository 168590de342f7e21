/** Job and rack filter on the server; the state filter stays on the client, where states tick over between fetches. */
export interface ReadyQuery {
  jobId?: number;
  rackId?: number;
  /** How long collected parts stay listed; the server's week unless a filter asks to see collected parts. */
  collectedDays?: number;
}

export const readyKeys = {
  all: ['ready'] as const,
  lists: () => [...readyKeys.all, 'list'] as const,
  list: (filters: ReadyQuery) => [...readyKeys.lists(), filters] as const,
  // Filter choices sit under `all` too, but live changes refresh only `lists()`.
  jobChoices: () => [...readyKeys.all, 'job-choices'] as const,
  rackChoices: () => [...readyKeys.all, 'rack-choices'] as const,
};

export interface SessionRange {
  from: string;
  to: string;
}

export type ReadyFilter = { jobId: number } | { rackId: number };

/**
 * Keys for what the spray session page reads, broad to narrow. Its own, so it never reads
 * another feature's cache shape; invalidating `details()` refreshes every open session.
 */
export const spraySessionKeys = {
  all: ['spray-session'] as const,
  lists: () => [...spraySessionKeys.all, 'list'] as const,
  list: (range: SessionRange) => [...spraySessionKeys.lists(), range] as const,
  details: () => [...spraySessionKeys.all, 'detail'] as const,
  detail: (id: number) => [...spraySessionKeys.details(), id] as const,
  mixes: (id: number) => [...spraySessionKeys.detail(id), 'mixes'] as const,
  coats: (id: number) => [...spraySessionKeys.detail(id), 'coats'] as const,
  denibs: (id: number) => [...spraySessionKeys.detail(id), 'denibs'] as const,
  booth: (id: number) => [...spraySessionKeys.all, 'booth', id] as const,
  racks: () => [...spraySessionKeys.all, 'racks'] as const,
  jobs: () => [...spraySessionKeys.all, 'jobs'] as const,
  job: (id: number) => [...spraySessionKeys.jobs(), id] as const,
  part: (id: number) => [...spraySessionKeys.all, 'part', id] as const,
  partByTag: (tag: string) => [...spraySessionKeys.all, 'part-by-tag', tag] as const,
  finishSystem: (id: number) => [...spraySessionKeys.all, 'finish-system', id] as const,
  product: (id: number) => [...spraySessionKeys.all, 'product', id] as const,
  readyAll: () => [...spraySessionKeys.all, 'ready'] as const,
  ready: (filter: ReadyFilter) => [...spraySessionKeys.readyAll(), filter] as const,
  latestReading: (boothId: number) => [...spraySessionKeys.all, 'latest-reading', boothId] as const,
};

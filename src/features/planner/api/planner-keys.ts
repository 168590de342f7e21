export interface SessionRange {
  from: string;
  to: string;
  boothId?: number;
  /** An admin looking at one site; left out, every site they see. */
  siteId?: number;
}

/** Keys for what the planner reads, broad to narrow; its own so it never reads another feature's cache shape. */
export const plannerKeys = {
  all: ['planner'] as const,
  sessions: () => [...plannerKeys.all, 'spray-sessions'] as const,
  sessionList: (range: SessionRange) => [...plannerKeys.sessions(), 'list', range] as const,
  session: (id: number) => [...plannerKeys.sessions(), 'detail', id] as const,
  booths: (siteId?: number) => [...plannerKeys.all, 'booths', siteId ?? 'every-site'] as const,
  jobs: () => [...plannerKeys.all, 'jobs'] as const,
  job: (id: number) => [...plannerKeys.jobs(), id] as const,
  jobParts: (jobId: number) => [...plannerKeys.job(jobId), 'parts'] as const,
  part: (id: number) => [...plannerKeys.all, 'part', id] as const,
  finishSystems: () => [...plannerKeys.all, 'finish-systems'] as const,
  products: () => [...plannerKeys.all, 'products'] as const,
  sprayers: (boothId?: number) => [...plannerKeys.all, 'sprayers', boothId ?? 'none'] as const,
};

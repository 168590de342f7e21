export interface CoatLogQuery {
  jobId?: number;
  productId?: number;
  /** Instants (ISO with offset) of the shop-day bounds. */
  from?: string;
  to?: string;
  history: boolean;
  page: number;
  pageSize: number;
}

export const coatLogKeys = {
  all: ['coat-log'] as const,
  lists: () => [...coatLogKeys.all, 'list'] as const,
  list: (query: CoatLogQuery) => [...coatLogKeys.lists(), query] as const,
  jobs: () => [...coatLogKeys.all, 'jobs'] as const,
  products: () => [...coatLogKeys.all, 'products'] as const,
  photos: () => [...coatLogKeys.all, 'photos'] as const,
};

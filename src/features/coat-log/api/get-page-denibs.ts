import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { coatSchema, type Coat } from '../../../../shared/schemas/coat';
import { listSchema, type List } from '../../../../shared/schemas/common';
import { denibSchema, type Denib } from '../../../../shared/schemas/denib';
import { apiClient } from '../../../lib/api-client';
import { coatLogKeys, type CoatLogQuery } from './coat-log-keys';

type Filters = Omit<CoatLogQuery, 'page' | 'pageSize'>;
type Range = { jobId?: number; from?: string; to?: string };

const denibListSchema = listSchema(denibSchema);
const oneCoatSchema = listSchema(coatSchema);

const denibsQueryOptions = (range: Range, enabled: boolean) =>
  queryOptions({
    queryKey: [...coatLogKeys.all, 'denibs', range] as const,
    queryFn: ({ signal }) => apiClient.get('/api/denibs', denibListSchema, { query: { ...range, pageSize: 500 }, signal }),
    enabled,
    placeholderData: keepPreviousData,
  });

/** The coat just before this page (the oldest on the page before), whose time bounds this page's denibs. */
const previousCoatQueryOptions = (filters: Filters, page: number, pageSize: number) =>
  queryOptions({
    queryKey: [...coatLogKeys.all, 'page-bound', filters, page, pageSize] as const,
    queryFn: ({ signal }) => apiClient.get('/api/coats', oneCoatSchema, { query: { ...filters, history: String(filters.history), page: (page - 1) * pageSize, pageSize: 1 }, signal }),
    enabled: page > 1,
  });

/**
 * The denibs that fall among this page of coats, so they show in line: from the page's oldest
 * coat (or the filter's start, on the last page) up to the page before's oldest coat (or the
 * filter's end, on the first page). Denibs have no product, so a product filter shows none.
 */
export function usePageDenibs(filters: Filters, page: number, pageSize: number, coats: List<Coat> | undefined): Denib[] {
  const previous = useQuery(previousCoatQueryOptions(filters, page, pageSize));
  const last = !coats || page * pageSize >= coats.total;
  const oldest = coats?.items.at(-1)?.sprayedAt;
  const to = page === 1 ? filters.to : previous.data?.items[0]?.sprayedAt;
  const range: Range = { jobId: filters.jobId, from: last ? filters.from : oldest, to };
  const ready = Boolean(coats) && !filters.productId && (page === 1 || Boolean(to));
  const denibs = useQuery(denibsQueryOptions(range, ready));
  return ready ? (denibs.data?.items ?? []) : [];
}

import { useQuery } from '@tanstack/react-query';
import type { Coat } from '../../../../shared/schemas/coat';
import type { List } from '../../../../shared/schemas/common';
import type { Denib } from '../../../../shared/schemas/denib';
import type { CoatFilters } from '../../../api/coats/coat-keys';
import { coatsQueryOptions } from '../../../api/coats/get-coats';
import { denibsQueryOptions } from '../../../api/denibs/get-denibs';

type Filters = Omit<CoatFilters, 'page' | 'pageSize'>;

/** The coat just before this page (the oldest on the page before), whose time bounds this page's denibs. */
function usePreviousCoat(filters: Filters, page: number, pageSize: number) {
  return useQuery({
    ...coatsQueryOptions({ ...filters, page: (page - 1) * pageSize, pageSize: 1 }),
    enabled: page > 1,
  });
}

/**
 * The denibs that fall among this page of coats, so they show in line: from the page's oldest
 * coat (or the filter's start, on the last page) up to the page before's oldest coat (or the
 * filter's end, on the first page). Denibs have no product, so a product filter shows none.
 */
export function usePageDenibs(
  filters: Filters,
  page: number,
  pageSize: number,
  coats: List<Coat> | undefined,
): Denib[] {
  const previous = usePreviousCoat(filters, page, pageSize);
  const last = !coats || page * pageSize >= coats.total;
  const oldest = coats?.items.at(-1)?.sprayedAt;
  const to = page === 1 ? filters.to : previous.data?.items[0]?.sprayedAt;
  const ready = Boolean(coats) && !filters.productId && (page === 1 || Boolean(to));
  const denibs = useQuery({
    ...denibsQueryOptions({ jobId: filters.jobId, from: last ? filters.from : oldest, to, pageSize: 500 }),
    enabled: ready,
  });
  return ready ? (denibs.data?.items ?? []) : [];
}

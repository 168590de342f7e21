import { queryOptions, useQuery } from '@tanstack/react-query';
import type { List } from '../../../shared/schemas/common';
import { getBooths } from '../booths/get-booths';
import { getRacks } from '../racks/get-racks';
import { getUsers } from '../users/get-users';
import { siteKeys } from './site-keys';

const pageSize = 200;
// Enough for any real group; a larger one is counted up to here rather than loaded without end.
const maxPages = 10;

export interface SiteCounts {
  booths: ReadonlyMap<number, number>;
  racks: ReadonlyMap<number, number>;
  users: ReadonlyMap<number, number>;
}

type PagedBySite = (
  filters: { page: number; pageSize: number },
  signal?: AbortSignal,
) => Promise<List<{ siteId: number }>>;

/** Counts one list by site, page by page. An admin's lists span every site when no site is named. */
async function countBySite(getPage: PagedBySite, signal?: AbortSignal): Promise<Map<number, number>> {
  const counts = new Map<number, number>();
  for (let page = 1; page <= maxPages; page += 1) {
    const list = await getPage({ page, pageSize }, signal);
    for (const { siteId } of list.items) counts.set(siteId, (counts.get(siteId) ?? 0) + 1);
    if (page * pageSize >= list.total) break;
  }
  return counts;
}

export async function getSiteCounts(signal?: AbortSignal): Promise<SiteCounts> {
  const [booths, racks, users] = await Promise.all(
    [getBooths, getRacks, getUsers].map((getPage) => countBySite(getPage, signal)),
  );
  return { booths, racks, users };
}

export const siteCountsQueryOptions = () =>
  queryOptions({ queryKey: siteKeys.counts(), queryFn: ({ signal }) => getSiteCounts(signal) });

export function useSiteCounts() {
  return useQuery(siteCountsQueryOptions());
}

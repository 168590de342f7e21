import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { listSchema } from '../../../../shared/schemas/common';
import { apiClient } from '../../../lib/api-client';
import { siteKeys } from './site-keys';

/** Only where each thing belongs is needed to count it. */
const placedListSchema = listSchema(z.object({ siteId: z.number().int() }));
const pageSize = 200;
// Enough for any real group; a larger one is counted up to here rather than loaded without end.
const maxPages = 10;

export interface SiteCounts {
  booths: ReadonlyMap<number, number>;
  racks: ReadonlyMap<number, number>;
  users: ReadonlyMap<number, number>;
}

/** Counts one list by site, page by page. An admin's lists span every site when no site is named. */
async function countBySite(path: string, signal?: AbortSignal): Promise<Map<number, number>> {
  const counts = new Map<number, number>();
  for (let page = 1; page <= maxPages; page += 1) {
    const list = await apiClient.get(path, placedListSchema, { query: { page, pageSize }, signal });
    for (const { siteId } of list.items) counts.set(siteId, (counts.get(siteId) ?? 0) + 1);
    if (page * pageSize >= list.total) break;
  }
  return counts;
}

export async function getSiteCounts(signal?: AbortSignal): Promise<SiteCounts> {
  const [booths, racks, users] = await Promise.all(['/api/booths', '/api/racks', '/api/users'].map((path) => countBySite(path, signal)));
  return { booths, racks, users };
}

export const siteCountsQueryOptions = () => queryOptions({ queryKey: siteKeys.counts(), queryFn: ({ signal }) => getSiteCounts(signal) });

export function useSiteCounts() {
  return useQuery(siteCountsQueryOptions());
}

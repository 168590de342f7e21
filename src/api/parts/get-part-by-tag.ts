import { queryOptions } from '@tanstack/react-query';
import { partResponseSchema } from '../../../shared/schemas/part';
import { apiClient } from '../../lib/api-client';
import { partKeys } from './part-keys';

export async function getPartByTag(tag: string, signal?: AbortSignal) {
  const { part } = await apiClient.get(`/api/parts/by-tag/${encodeURIComponent(tag)}`, partResponseSchema, { signal });
  return part;
}

/** Fetched on demand (a scan, a typed code) through queryClient.fetchQuery, not as a live query. */
export const partByTagQueryOptions = (tag: string) =>
  queryOptions({ queryKey: partKeys.byTag(tag), queryFn: ({ signal }) => getPartByTag(tag, signal), staleTime: 0 });

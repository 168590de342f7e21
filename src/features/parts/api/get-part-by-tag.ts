import { queryOptions } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { partResponseSchema } from './get-part';
import { partKeys } from './part-keys';

/** Tags are printed in capitals; people type them any way. */
export const normaliseTag = (typed: string) => typed.replace(/[\s-]/g, '').toUpperCase();

export async function getPartByTag(tag: string, signal?: AbortSignal) {
  const { part } = await apiClient.get(`/api/parts/by-tag/${encodeURIComponent(tag)}`, partResponseSchema, { signal });
  return part;
}

/** Used on demand (the "Find a tag" box) through queryClient.fetchQuery, not as a live query. */
export const partByTagQueryOptions = (tag: string) =>
  queryOptions({ queryKey: partKeys.byTag(tag), queryFn: ({ signal }) => getPartByTag(tag, signal), staleTime: 0 });

import { queryOptions } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { partResponseSchema } from './get-session-parts';
import { spraySessionKeys } from './spray-session-keys';

/** Tags are printed in capitals in two groups of four; people type them any way. */
export const normaliseTag = (typed: string) => typed.replace(/[\s-]/g, '').toUpperCase();

export async function getPartByTag(tag: string, signal?: AbortSignal) {
  const { part } = await apiClient.get(`/api/parts/by-tag/${encodeURIComponent(tag)}`, partResponseSchema, { signal });
  return part;
}

/** Fetched on demand (a scan or a typed code) through queryClient.fetchQuery. */
export const partByTagQueryOptions = (tag: string) =>
  queryOptions({ queryKey: spraySessionKeys.partByTag(tag), queryFn: ({ signal }) => getPartByTag(tag, signal), staleTime: 0 });

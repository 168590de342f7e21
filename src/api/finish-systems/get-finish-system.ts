import { queryOptions, useQueries } from '@tanstack/react-query';
import { finishSystemResponseSchema, type FinishSystem } from '../../../shared/schemas/finish-system';
import { apiClient } from '../../lib/api-client';
import { finishSystemKeys } from './finish-system-keys';

export async function getFinishSystem(id: number, signal?: AbortSignal) {
  const { finishSystem } = await apiClient.get(`/api/finish-systems/${id}`, finishSystemResponseSchema, { signal });
  return finishSystem;
}

export const finishSystemQueryOptions = (id: number) =>
  queryOptions({ queryKey: finishSystemKeys.detail(id), queryFn: ({ signal }) => getFinishSystem(id, signal) });

/** The finish systems given, each from its own cached detail. */
export function useFinishSystemsById(ids: number[]): { systems: FinishSystem[]; pending: boolean; error: unknown } {
  return useQueries({
    queries: ids.map((id) => finishSystemQueryOptions(id)),
    combine: (results) => ({
      systems: results.flatMap((r) => (r.data ? [r.data] : [])),
      pending: results.some((r) => r.isPending),
      error: results.find((r) => r.isError)?.error ?? null,
    }),
  });
}

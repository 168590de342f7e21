import { queryOptions, useQueries } from '@tanstack/react-query';
import { z } from 'zod';
import { finishSystemSchema, type FinishSystem } from '../../../../shared/schemas/finish-system';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

const finishSystemResponseSchema = z.object({ finishSystem: finishSystemSchema });

export async function getFinishSystem(id: number, signal?: AbortSignal) {
  const { finishSystem } = await apiClient.get(`/api/finish-systems/${id}`, finishSystemResponseSchema, { signal });
  return finishSystem;
}

export const finishSystemQueryOptions = (id: number) =>
  queryOptions({ queryKey: spraySessionKeys.finishSystem(id), queryFn: ({ signal }) => getFinishSystem(id, signal), staleTime: 5 * 60_000 });

export function useFinishSystems(ids: number[]): { systems: FinishSystem[]; pending: boolean } {
  return useQueries({
    queries: ids.map((id) => finishSystemQueryOptions(id)),
    combine: (results) => ({ systems: results.flatMap((r) => (r.data ? [r.data] : [])), pending: results.some((r) => r.isPending) }),
  });
}

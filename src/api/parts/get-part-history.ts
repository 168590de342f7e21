import { queryOptions, useQuery } from '@tanstack/react-query';
import { partHistoryResponseSchema } from '../../../shared/schemas/part-history';
import { apiClient } from '../../lib/api-client';
import { partKeys } from './part-keys';

export async function getPartHistory(id: number, signal?: AbortSignal) {
  const { history } = await apiClient.get(`/api/parts/${id}/history`, partHistoryResponseSchema, { signal });
  return history;
}

/** Refetched now and then as well as on live changes: windows open and close on the server's clock. */
export const partHistoryQueryOptions = (id: number) =>
  queryOptions({
    queryKey: partKeys.history(id),
    queryFn: ({ signal }) => getPartHistory(id, signal),
    refetchInterval: 60_000,
  });

export function usePartHistory(id: number, enabled = true) {
  return useQuery({ ...partHistoryQueryOptions(id), enabled });
}

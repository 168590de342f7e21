import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { listSchema } from '../../../../shared/schemas/common';
import { spraySessionSchema } from '../../../../shared/schemas/spray-session';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys, type SessionRange } from './spray-session-keys';

const sessionListSchema = listSchema(spraySessionSchema);

export function getSpraySessions(range: SessionRange, signal?: AbortSignal) {
  return apiClient.get('/api/spray-sessions', sessionListSchema, { query: { ...range, pageSize: 1000 }, signal });
}

export const spraySessionsQueryOptions = (range: SessionRange) =>
  queryOptions({
    queryKey: spraySessionKeys.list(range),
    queryFn: ({ signal }) => getSpraySessions(range, signal),
    placeholderData: keepPreviousData,
    refetchInterval: 60_000,
  });

export function useSpraySessions(range: SessionRange) {
  return useQuery(spraySessionsQueryOptions(range));
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { listSchema } from '../../../../shared/schemas/common';
import { rackSchema } from '../../../../shared/schemas/rack';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

const rackListSchema = listSchema(rackSchema);

export function getRacks(signal?: AbortSignal) {
  return apiClient.get('/api/racks', rackListSchema, { query: { page: 1, pageSize: 200 }, signal });
}

/** For choosing parts by rack, and for the heated racks' drying temperature. */
export const racksQueryOptions = () =>
  queryOptions({ queryKey: spraySessionKeys.racks(), queryFn: ({ signal }) => getRacks(signal), staleTime: 5 * 60_000 });

export function useRacks() {
  return useQuery(racksQueryOptions());
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { boothSchema } from '../../../../shared/schemas/booth';
import { listSchema } from '../../../../shared/schemas/common';
import { apiClient } from '../../../lib/api-client';
import { reportKeys } from './report-keys';

const boothChoicesSchema = listSchema(boothSchema.pick({ id: true, name: true }));

export function getBoothChoices(signal?: AbortSignal) {
  return apiClient.get('/api/booths', boothChoicesSchema, { query: { page: 1, pageSize: 200 }, signal });
}

/** The booths to report on; a shop has a handful, so one page holds them all. */
export const boothChoicesQueryOptions = () => queryOptions({ queryKey: reportKeys.booths(), queryFn: ({ signal }) => getBoothChoices(signal), staleTime: 5 * 60_000 });

export function useBoothChoices() {
  return useQuery(boothChoicesQueryOptions());
}

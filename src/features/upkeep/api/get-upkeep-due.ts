import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { upkeepDueSchema } from '../../../../shared/schemas/upkeep';
import { apiClient } from '../../../lib/api-client';
import { upkeepKeys } from './upkeep-keys';

const responseSchema = z.object({ due: upkeepDueSchema });

export async function getUpkeepDue(siteId: number | undefined, signal?: AbortSignal) {
  return (await apiClient.get('/api/upkeep/due', responseSchema, { query: { siteId }, signal })).due;
}

export const upkeepDueQueryOptions = (siteId: number | undefined) => queryOptions({ queryKey: upkeepKeys.due(siteId), queryFn: ({ signal }) => getUpkeepDue(siteId, signal) });

export function useUpkeepDue(siteId: number | undefined) {
  return useQuery(upkeepDueQueryOptions(siteId));
}

import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { partSchema } from '../../../../shared/schemas/part';
import { apiClient } from '../../../lib/api-client';
import { plannerKeys } from './planner-keys';

const partResponseSchema = z.object({ part: partSchema });

export async function getPart(id: number, signal?: AbortSignal) {
  const { part } = await apiClient.get(`/api/parts/${id}`, partResponseSchema, { signal });
  return part;
}

/** Used with useQueries for a session's planned parts. */
export const partQueryOptions = (id: number) => queryOptions({ queryKey: plannerKeys.part(id), queryFn: ({ signal }) => getPart(id, signal), staleTime: 60_000 });

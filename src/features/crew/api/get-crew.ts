import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { crewStatusSchema } from '../../../../shared/schemas/crew';
import { apiClient } from '../../../lib/api-client';
import { crewKeys } from './crew-keys';

const responseSchema = z.object({ items: z.array(crewStatusSchema) });

/** Everyone's status, never their details: what a lead may see. */
export async function getCrew(siteId: number | undefined, signal?: AbortSignal) {
  return (await apiClient.get('/api/crew', responseSchema, { query: { siteId }, signal })).items;
}

export const crewQueryOptions = (siteId: number | undefined) => queryOptions({ queryKey: crewKeys.list(siteId), queryFn: ({ signal }) => getCrew(siteId, signal) });

export function useCrew(siteId: number | undefined) {
  return useQuery(crewQueryOptions(siteId));
}

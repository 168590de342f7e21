import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { boothSchema } from '../../../../shared/schemas/booth';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

const boothResponseSchema = z.object({ booth: boothSchema });

export async function getSessionBooth(id: number, signal?: AbortSignal) {
  const { booth } = await apiClient.get(`/api/booths/${id}`, boothResponseSchema, { signal });
  return booth;
}

/** Clearance time, face velocity minimum and the booth's name for the cautions. */
export const sessionBoothQueryOptions = (id: number) =>
  queryOptions({ queryKey: spraySessionKeys.booth(id), queryFn: ({ signal }) => getSessionBooth(id, signal), staleTime: 5 * 60_000 });

export function useSessionBooth(id: number) {
  return useQuery(sessionBoothQueryOptions(id));
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { crewDetailSchema } from '../../../../shared/schemas/crew';
import { apiClient } from '../../../lib/api-client';
import { crewKeys } from './crew-keys';

const responseSchema = z.object({ crew: crewDetailSchema });

/** One person's records in full: their own, or anyone's for the owner. */
export async function getCrewPerson(userId: number, signal?: AbortSignal) {
  return (await apiClient.get(`/api/crew/${userId}`, responseSchema, { signal })).crew;
}

export const crewPersonQueryOptions = (userId: number) => queryOptions({ queryKey: crewKeys.person(userId), queryFn: ({ signal }) => getCrewPerson(userId, signal) });

export function useCrewPerson(userId: number) {
  return useQuery(crewPersonQueryOptions(userId));
}

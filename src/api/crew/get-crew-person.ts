import { queryOptions, useQuery } from '@tanstack/react-query';
import { crewDetailResponseSchema } from '../../../shared/schemas/crew';
import { apiClient } from '../../lib/api-client';
import { crewKeys } from './crew-keys';

/** One person's records in full: their own, or anyone's for the owner. */
export async function getCrewPerson(userId: number, signal?: AbortSignal) {
  const { crew } = await apiClient.get(`/api/crew/${userId}`, crewDetailResponseSchema, { signal });
  return crew;
}

export const crewPersonQueryOptions = (userId: number) =>
  queryOptions({ queryKey: crewKeys.person(userId), queryFn: ({ signal }) => getCrewPerson(userId, signal) });

export function useCrewPerson(userId: number) {
  return useQuery(crewPersonQueryOptions(userId));
}

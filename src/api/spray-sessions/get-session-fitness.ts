import { queryOptions, useQuery } from '@tanstack/react-query';
import { sessionFitnessResponseSchema } from '../../../shared/schemas/upkeep';
import { apiClient } from '../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

export async function getSessionFitness(id: number, signal?: AbortSignal) {
  const { fitness } = await apiClient.get(`/api/spray-sessions/${id}/fitness`, sessionFitnessResponseSchema, {
    signal,
  });
  return fitness;
}

/** Fit to spray: the booth's upkeep and the sprayer's records, for each respiratory protection. */
export const sessionFitnessQueryOptions = (id: number) =>
  queryOptions({ queryKey: spraySessionKeys.fitness(id), queryFn: ({ signal }) => getSessionFitness(id, signal) });

export function useSessionFitness(id: number, enabled: boolean) {
  return useQuery({ ...sessionFitnessQueryOptions(id), enabled });
}

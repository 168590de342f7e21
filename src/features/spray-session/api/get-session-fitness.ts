import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { sessionFitnessSchema } from '../../../../shared/schemas/upkeep';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

const responseSchema = z.object({ fitness: sessionFitnessSchema });

export async function getSessionFitness(id: number, signal?: AbortSignal) {
  return (await apiClient.get(`/api/spray-sessions/${id}/fitness`, responseSchema, { signal })).fitness;
}

/** Fit to spray: the booth's upkeep and the sprayer's records, for each respiratory protection. */
export const sessionFitnessQueryOptions = (id: number) => queryOptions({ queryKey: [...spraySessionKeys.detail(id), 'fitness'], queryFn: ({ signal }) => getSessionFitness(id, signal) });

export function useSessionFitness(id: number, enabled: boolean) {
  return useQuery({ ...sessionFitnessQueryOptions(id), enabled });
}

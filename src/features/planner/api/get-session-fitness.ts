import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { sessionFitnessSchema } from '../../../../shared/schemas/upkeep';
import { apiClient } from '../../../lib/api-client';
import { plannerKeys } from './planner-keys';

const responseSchema = z.object({ fitness: sessionFitnessSchema });

export async function getSessionFitness(id: number, signal?: AbortSignal) {
  return (await apiClient.get(`/api/spray-sessions/${id}/fitness`, responseSchema, { signal })).fitness;
}

/** Whether the booth and the assigned sprayer are fit to spray this session, and why not. */
export const sessionFitnessQueryOptions = (id: number) => queryOptions({ queryKey: [...plannerKeys.all, 'fitness', id], queryFn: ({ signal }) => getSessionFitness(id, signal) });

export function useSessionFitness(id: number, enabled: boolean) {
  return useQuery({ ...sessionFitnessQueryOptions(id), enabled });
}

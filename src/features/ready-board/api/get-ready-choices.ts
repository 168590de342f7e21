import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { readyKeys } from './ready-keys';

// Only what the filters need, so the board does not depend on the jobs or racks screens' shapes.
const jobChoicesSchema = z.object({ items: z.array(z.object({ id: z.number(), reference: z.string(), customer: z.string() })) });
const rackChoicesSchema = z.object({ items: z.array(z.object({ id: z.number(), name: z.string() })) });

export type JobChoice = z.infer<typeof jobChoicesSchema>['items'][number];
export type RackChoice = z.infer<typeof rackChoicesSchema>['items'][number];

export async function getJobChoices(signal?: AbortSignal): Promise<JobChoice[]> {
  const { items } = await apiClient.get('/api/jobs', jobChoicesSchema, { query: { pageSize: 200 }, signal });
  return [...items].sort((a, b) => a.reference.localeCompare(b.reference, 'en-GB', { numeric: true }));
}

export async function getRackChoices(signal?: AbortSignal): Promise<RackChoice[]> {
  const { items } = await apiClient.get('/api/racks', rackChoicesSchema, { query: { pageSize: 200 }, signal });
  return items;
}

export const jobChoicesQueryOptions = () =>
  queryOptions({ queryKey: readyKeys.jobChoices(), queryFn: ({ signal }) => getJobChoices(signal), staleTime: 5 * 60_000 });

export const rackChoicesQueryOptions = () =>
  queryOptions({ queryKey: readyKeys.rackChoices(), queryFn: ({ signal }) => getRackChoices(signal), staleTime: 5 * 60_000 });

export function useJobChoices() {
  return useQuery(jobChoicesQueryOptions());
}

export function useRackChoices() {
  return useQuery(rackChoicesQueryOptions());
}

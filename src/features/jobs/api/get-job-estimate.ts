import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import type { SprayMethod } from '../../../../shared/finishing/material';
import { apiClient } from '../../../lib/api-client';
import { jobKeys } from './job-keys';

const mixSchema = z.object({ baseL: z.number(), hardenerL: z.number(), thinnerL: z.number(), totalL: z.number() });

// The server builds this from shared/finishing/estimate.ts, which has types but no zod schema.
const estimateSchema = z.object({
  areaM2: z.number(),
  transferEfficiencyPct: z.number(),
  method: z.string(),
  steps: z.array(
    z.object({
      position: z.number().int(),
      productId: z.number().int(),
      productName: z.string(),
      dryFilmUm: z.number(),
      mixedL: z.number(),
      readyToSprayL: z.number(),
      mix: mixSchema,
      vocG: z.number().nullable(),
      cost: z.number().nullable(),
    }),
  ),
  totals: z.object({
    mixedL: z.number(),
    readyToSprayL: z.number(),
    vocG: z.number(),
    cost: z.number(),
    stepsWithoutVoc: z.number().int(),
    stepsWithoutPrice: z.number().int(),
  }),
});
export type JobEstimate = z.infer<typeof estimateSchema>;

export async function getJobEstimate(id: number, method: SprayMethod, transferEfficiencyPct?: number, signal?: AbortSignal) {
  const { estimate } = await apiClient.get(`/api/jobs/${id}/estimate`, z.object({ estimate: estimateSchema }), { query: { method, transferEfficiencyPct }, signal });
  return estimate;
}

export const jobEstimateQueryOptions = (id: number, method: SprayMethod, transferEfficiencyPct?: number) =>
  queryOptions({
    queryKey: jobKeys.estimate(id, method, transferEfficiencyPct),
    queryFn: ({ signal }) => getJobEstimate(id, method, transferEfficiencyPct, signal),
    placeholderData: keepPreviousData,
  });

export function useJobEstimate(id: number, method: SprayMethod, transferEfficiencyPct?: number) {
  return useQuery(jobEstimateQueryOptions(id, method, transferEfficiencyPct));
}

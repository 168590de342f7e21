import { queryOptions, useQuery } from '@tanstack/react-query';
import { upkeepReportSchema } from '../../../shared/schemas/report';
import { apiClient } from '../../lib/api-client';
import { reportKeys, type ReportParams } from './report-keys';
import { reportPath } from './report-url';

export async function getUpkeepReport(params: ReportParams['upkeep'], signal?: AbortSignal) {
  const { report } = await apiClient.get(reportPath('upkeep'), upkeepReportSchema, { query: params, signal });
  return report;
}

export const upkeepReportQueryOptions = (params: ReportParams['upkeep']) =>
  queryOptions({
    queryKey: reportKeys.detail('upkeep', params),
    queryFn: ({ signal }) => getUpkeepReport(params, signal),
    staleTime: 60_000,
  });

export function useUpkeepReport(params: ReportParams['upkeep']) {
  return useQuery(upkeepReportQueryOptions(params));
}

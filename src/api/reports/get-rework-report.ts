import { queryOptions, useQuery } from '@tanstack/react-query';
import { reworkReportSchema } from '../../../shared/schemas/report';
import { apiClient } from '../../lib/api-client';
import { reportKeys, type ReportParams } from './report-keys';
import { reportPath } from './report-url';

export async function getReworkReport(params: ReportParams['rework'], signal?: AbortSignal) {
  const { report } = await apiClient.get(reportPath('rework'), reworkReportSchema, { query: params, signal });
  return report;
}

export const reworkReportQueryOptions = (params: ReportParams['rework']) =>
  queryOptions({
    queryKey: reportKeys.detail('rework', params),
    queryFn: ({ signal }) => getReworkReport(params, signal),
    staleTime: 60_000,
  });

export function useReworkReport(params: ReportParams['rework']) {
  return useQuery(reworkReportQueryOptions(params));
}

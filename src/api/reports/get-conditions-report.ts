import { queryOptions, useQuery } from '@tanstack/react-query';
import { conditionsReportSchema } from '../../../shared/schemas/report';
import { apiClient } from '../../lib/api-client';
import { reportKeys, type ReportParams } from './report-keys';
import { reportPath } from './report-url';

export async function getConditionsReport(params: ReportParams['conditions'], signal?: AbortSignal) {
  const { report } = await apiClient.get(reportPath('conditions'), conditionsReportSchema, { query: params, signal });
  return report;
}

export const conditionsReportQueryOptions = (params: ReportParams['conditions']) =>
  queryOptions({
    queryKey: reportKeys.detail('conditions', params),
    queryFn: ({ signal }) => getConditionsReport(params, signal),
    staleTime: 60_000,
  });

export function useConditionsReport(params: ReportParams['conditions']) {
  return useQuery(conditionsReportQueryOptions(params));
}

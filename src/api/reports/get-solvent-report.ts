import { queryOptions, useQuery } from '@tanstack/react-query';
import { solventReportSchema } from '../../../shared/schemas/report';
import { apiClient } from '../../lib/api-client';
import { reportKeys, type ReportParams } from './report-keys';
import { reportPath } from './report-url';

export async function getSolventReport(params: ReportParams['solvent'], signal?: AbortSignal) {
  const { report } = await apiClient.get(reportPath('solvent'), solventReportSchema, { query: params, signal });
  return report;
}

export const solventReportQueryOptions = (params: ReportParams['solvent']) =>
  queryOptions({
    queryKey: reportKeys.detail('solvent', params),
    queryFn: ({ signal }) => getSolventReport(params, signal),
    staleTime: 60_000,
  });

export function useSolventReport(params: ReportParams['solvent']) {
  return useQuery(solventReportQueryOptions(params));
}

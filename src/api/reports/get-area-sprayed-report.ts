import { queryOptions, useQuery } from '@tanstack/react-query';
import { areaSprayedReportSchema } from '../../../shared/schemas/report';
import { apiClient } from '../../lib/api-client';
import { reportKeys, type ReportParams } from './report-keys';
import { reportPath } from './report-url';

export async function getAreaSprayedReport(params: ReportParams['area-sprayed'], signal?: AbortSignal) {
  const { report } = await apiClient.get(reportPath('area-sprayed'), areaSprayedReportSchema, {
    query: params,
    signal,
  });
  return report;
}

export const areaSprayedReportQueryOptions = (params: ReportParams['area-sprayed']) =>
  queryOptions({
    queryKey: reportKeys.detail('area-sprayed', params),
    queryFn: ({ signal }) => getAreaSprayedReport(params, signal),
    staleTime: 60_000,
  });

export function useAreaSprayedReport(params: ReportParams['area-sprayed']) {
  return useQuery(areaSprayedReportQueryOptions(params));
}

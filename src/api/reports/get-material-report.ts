import { queryOptions, useQuery } from '@tanstack/react-query';
import { materialReportSchema } from '../../../shared/schemas/report';
import { apiClient } from '../../lib/api-client';
import { reportKeys, type ReportParams } from './report-keys';
import { reportPath } from './report-url';

export async function getMaterialReport(params: ReportParams['material'], signal?: AbortSignal) {
  const { report } = await apiClient.get(reportPath('material'), materialReportSchema, { query: params, signal });
  return report;
}

export const materialReportQueryOptions = (params: ReportParams['material']) =>
  queryOptions({
    queryKey: reportKeys.detail('material', params),
    queryFn: ({ signal }) => getMaterialReport(params, signal),
    staleTime: 60_000,
  });

export function useMaterialReport(params: ReportParams['material']) {
  return useQuery(materialReportQueryOptions(params));
}

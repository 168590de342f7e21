import { queryOptions, useQuery } from '@tanstack/react-query';
import { boothUseReportSchema } from '../../../shared/schemas/report';
import { apiClient } from '../../lib/api-client';
import { reportKeys, type ReportParams } from './report-keys';
import { reportPath } from './report-url';

export async function getBoothUseReport(params: ReportParams['booth-use'], signal?: AbortSignal) {
  const { report } = await apiClient.get(reportPath('booth-use'), boothUseReportSchema, { query: params, signal });
  return report;
}

export const boothUseReportQueryOptions = (params: ReportParams['booth-use']) =>
  queryOptions({
    queryKey: reportKeys.detail('booth-use', params),
    queryFn: ({ signal }) => getBoothUseReport(params, signal),
    staleTime: 60_000,
  });

export function useBoothUseReport(params: ReportParams['booth-use']) {
  return useQuery(boothUseReportQueryOptions(params));
}

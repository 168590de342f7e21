import type { ReportKind, ReportParams } from './report-keys';

export const reportPath = (kind: ReportKind) => `/api/reports/${kind}`;

/**
 * The address of a report's CSV: the same call with `format=csv`. A plain link is enough: it is a
 * GET with the sign-in cookie, and the server names the file (Content-Disposition: attachment).
 */
export function reportCsvHref<K extends ReportKind>(kind: K, params: ReportParams[K]): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params))
    if (value !== undefined && value !== null) search.set(key, String(value));
  search.set('format', 'csv');
  return `${reportPath(kind)}?${search.toString()}`;
}

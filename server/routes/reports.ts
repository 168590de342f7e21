import type { z } from 'zod';
import {
  areaSprayedQuerySchema,
  areaSprayedReportSchema,
  boothUseQuerySchema,
  boothUseReportSchema,
  conditionsQuerySchema,
  conditionsReportSchema,
  materialQuerySchema,
  materialReportSchema,
  reportRangeQuerySchema,
  reworkReportSchema,
  solventReportSchema,
  upkeepReportSchema,
} from '../../shared/schemas/report';
import { answered, defineRoute, type ApiRoute } from '../registry/route';
import type { ReportService } from '../services/reports';
import { reportCsv } from '../services/reports/csv-tables';

type ReportQuery = { from: string; to: string; format: 'json' | 'csv' };

interface ReportRoute {
  name: keyof ReportService & keyof typeof reportCsv;
  path: string;
  summary: string;
  query: z.ZodObject;
  /** The `{ report }` envelope. */
  schema: z.ZodType;
  /** `site` when the report reads only its site's booths, sessions and records; `any` when it reads parts or jobs (the group's). */
  clearedBy: 'site' | 'any';
}

/**
 * One report: JSON `{ report }`, or its table as a CSV download with `format=csv`. Every report
 * takes `from` and `to` (shop dates, both included); its site is the scope's (an admin ?siteId).
 */
function reportRoute(r: ReportRoute): ApiRoute {
  return defineRoute({
    method: 'get',
    path: `/api/reports/${r.path}`,
    summary: r.summary,
    access: 'reports:read',
    sites: 'site',
    query: r.query,
    response: {
      status: 200,
      schema: r.schema,
      description: '`{ report }`, or the report’s table as text/csv with format=csv',
    },
    // A CSV download is written by the handler itself and never kept; the JSON report is.
    cache: { clearedBy: r.clearedBy },
    handler: async ({ query }, { services, res }) => {
      const q = query as ReportQuery;
      const report = await (services.reports[r.name] as (query: unknown) => Promise<unknown>)(query);
      if (q.format === 'json') return { report };
      const csv = reportCsv[r.name] as (report: unknown) => string;
      res.attachment(`boothwright-${r.path}-${q.from}-to-${q.to}.csv`).type('text/csv').send(csv(report));
      return answered;
    },
  });
}

export const reportRoutes: ApiRoute[] = [
  reportRoute({
    name: 'boothUse',
    clearedBy: 'site',
    path: 'booth-use',
    summary: 'Hours booked and sprayed per booth per week (?boothId)',
    query: boothUseQuerySchema,
    schema: boothUseReportSchema,
  }),
  reportRoute({
    name: 'areaSprayed',
    clearedBy: 'any',
    path: 'area-sprayed',
    summary: 'Area sprayed per week (?groupBy=product-kind|job)',
    query: areaSprayedQuerySchema,
    schema: areaSprayedReportSchema,
  }),
  reportRoute({
    name: 'conditions',
    clearedBy: 'site',
    path: 'conditions',
    summary: 'Booth conditions against product limits (?boothId)',
    query: conditionsQuerySchema,
    schema: conditionsReportSchema,
  }),
  reportRoute({
    name: 'solvent',
    clearedBy: 'site',
    path: 'solvent',
    summary: 'Litres mixed and VOC per month with the yearly total',
    query: reportRangeQuerySchema,
    schema: solventReportSchema,
  }),
  reportRoute({
    name: 'material',
    clearedBy: 'any',
    path: 'material',
    summary: 'Litres used against the estimate per job and product (?jobId)',
    query: materialQuerySchema,
    schema: materialReportSchema,
  }),
  reportRoute({
    name: 'rework',
    clearedBy: 'any',
    path: 'rework',
    summary: 'Coats corrected or re-sprayed by reason per month',
    query: reportRangeQuerySchema,
    schema: reworkReportSchema,
  }),
  reportRoute({
    name: 'upkeep',
    clearedBy: 'site',
    path: 'upkeep',
    summary: 'Booth upkeep and crew records done against due: per booth, and the site’s crew as counts',
    query: reportRangeQuerySchema,
    schema: upkeepReportSchema,
  }),
];

import { Router, type Request, type Response } from 'express';
import { siteScopeOf } from '../lib/site-scope';
import type { z } from 'zod';
import { areaSprayedQuerySchema, boothUseQuerySchema, conditionsQuerySchema, materialQuerySchema, reportRangeQuerySchema } from '../../shared/schemas/report';
import { requirePermission } from '../middleware/permissions';
import type { ReportService } from '../services/reports';
import { reportCsv } from '../services/reports/csv-tables';

/** JSON `{ report }`, or the report's table as a CSV download when `format=csv`. */
function send<R>(res: Response, name: string, format: 'json' | 'csv', report: R, csv: (r: R) => string, range: { from: string; to: string }) {
  if (format === 'json') return void res.json({ report });
  res.attachment(`boothwright-${name}-${range.from}-to-${range.to}.csv`).type('text/csv').send(csv(report));
}

function reportRoute<S extends z.ZodType<{ from: string; to: string; format: 'json' | 'csv'; siteId?: number }>, R>(name: string, schema: S, run: (q: z.infer<S>) => Promise<R>, csv: (r: R) => string) {
  return async (req: Request, res: Response) => {
    const query = schema.parse(req.query);
    // A lead's reports are their site's whatever they ask; an admin's are the site named, or all.
    const siteId = siteScopeOf(req).siteId ?? undefined;
    send(res, name, query.format, await run({ ...query, siteId }), csv, query);
  };
}

export function reportRoutes(reports: ReportService): Router {
  const router = Router();
  router.use(requirePermission('reports:read'));
  router.get('/booth-use', reportRoute('booth-use', boothUseQuerySchema, reports.boothUse, reportCsv.boothUse));
  router.get('/area-sprayed', reportRoute('area-sprayed', areaSprayedQuerySchema, reports.areaSprayed, reportCsv.areaSprayed));
  router.get('/conditions', reportRoute('conditions', conditionsQuerySchema, reports.conditions, reportCsv.conditions));
  router.get('/solvent', reportRoute('solvent', reportRangeQuerySchema, reports.solvent, reportCsv.solvent));
  router.get('/material', reportRoute('material', materialQuerySchema, reports.material, reportCsv.material));
  router.get('/rework', reportRoute('rework', reportRangeQuerySchema, reports.rework, reportCsv.rework));
  return router;
}

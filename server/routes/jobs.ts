import { Router } from 'express';
import { z } from 'zod';
import { idParamsSchema } from '../../shared/schemas/common';
import { createJobSchema, estimateQuerySchema, jobListQuerySchema, updateJobSchema } from '../../shared/schemas/job';
import { createPartSchema, csvTemplateHeaders, importMappingSchema, partListQuerySchema, updatePartSchema } from '../../shared/schemas/part';
import { AppError } from '../lib/app-error';
import { actorOf } from '../lib/actor';
import { requirePermission } from '../middleware/permissions';
import { singleUpload } from '../middleware/upload';
import type { EstimateService } from '../services/estimates';
import type { JobService } from '../services/jobs';
import type { PartImportService } from '../services/part-import';
import type { PartService } from '../services/parts';

const importFormSchema = z.object({
  preview: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
  mapping: z
    .string()
    .default('{}')
    .transform((text, ctx) => {
      try {
        return importMappingSchema.parse(JSON.parse(text));
      } catch {
        ctx.addIssue({ code: 'custom', message: 'The column mapping is not valid JSON' });
        return z.NEVER;
      }
    }),
});

export function jobRoutes(jobs: JobService, parts: PartService, imports: PartImportService, estimates: EstimateService): Router {
  const router = Router();

  router.get('/', requirePermission('jobs:read'), async (req, res) => {
    res.json(await jobs.list(jobListQuerySchema.parse(req.query)));
  });
  router.post('/', requirePermission('jobs:write'), async (req, res) => {
    res.status(201).json({ job: await jobs.create(createJobSchema.parse(req.body), actorOf(req)) });
  });
  router.get('/parts-template.csv', requirePermission('jobs:read'), (_req, res) => {
    res.attachment('boothwright-cut-list.csv').type('text/csv');
    res.send(`${csvTemplateHeaders.join(',')}\nDoor 1,door,715,496,18,2,both,yes\nDrawer side,drawer,450,120,15,8,both,no\n`);
  });
  router.get('/:id', requirePermission('jobs:read'), async (req, res) => {
    res.json({ job: await jobs.get(idParamsSchema.parse(req.params).id) });
  });
  router.patch('/:id', requirePermission('jobs:write'), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json({ job: await jobs.update(id, updateJobSchema.parse(req.body), actorOf(req)) });
  });
  router.get('/:id/estimate', requirePermission('jobs:read'), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json({ estimate: await estimates.forJob(id, estimateQuerySchema.parse(req.query)) });
  });
  router.get('/:id/parts', requirePermission('jobs:read'), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await parts.listForJob(id, partListQuerySchema.parse(req.query)));
  });
  router.post('/:id/parts', requirePermission('jobs:write'), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.status(201).json({ part: await parts.create(id, createPartSchema.parse(req.body), actorOf(req)) });
  });
  router.post('/:id/parts/import', requirePermission('jobs:write'), singleUpload(2 * 1024 * 1024), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const form = importFormSchema.parse(req.body ?? {});
    const result = await imports.importCsv(id, req.file?.buffer, form.mapping, form.preview, actorOf(req));
    if (!form.preview && result.errors.length) {
      const fields = Object.fromEntries(result.errors.map((e) => [`rows.${e.row}.${e.field}`, e.message]));
      throw new AppError('validation_failed', `${new Set(result.errors.map((e) => e.row)).size} rows need fixing; nothing was saved`, fields);
    }
    res.status(result.saved ? 201 : 200).json(result);
  });

  return router;
}

export function partRoutes(parts: PartService): Router {
  const router = Router();
  router.get('/by-tag/:tag', requirePermission('jobs:read'), async (req, res) => {
    res.json({ part: await parts.getByTag(z.object({ tag: z.string().max(16) }).parse(req.params).tag) });
  });
  router.get('/:id', requirePermission('jobs:read'), async (req, res) => {
    res.json({ part: await parts.get(idParamsSchema.parse(req.params).id) });
  });
  router.patch('/:id', requirePermission('jobs:write'), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json({ part: await parts.update(id, updatePartSchema.parse(req.body), actorOf(req)) });
  });
  router.post('/:id/collect', requirePermission('parts:collect'), async (req, res) => {
    res.json({ part: await parts.setCollected(idParamsSchema.parse(req.params).id, true, actorOf(req)) });
  });
  // Undo for a mis-tap on the ready board.
  router.delete('/:id/collect', requirePermission('parts:collect'), async (req, res) => {
    res.json({ part: await parts.setCollected(idParamsSchema.parse(req.params).id, false, actorOf(req)) });
  });
  return router;
}

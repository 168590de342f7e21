import { z } from 'zod';
import { idParamsSchema } from '../../shared/schemas/common';
import { partHistoryResponseSchema } from '../../shared/schemas/part-history';
import { createPartSchema, csvTemplateHeaders, importMappingSchema, importResultSchema, partIdsQuerySchema, partListQuerySchema, partListSchema, partResponseSchema, updatePartSchema } from '../../shared/schemas/part';
import { answered, defineRoute, Reply, type ApiRoute } from '../registry/route';

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

const templateCsv = `${csvTemplateHeaders.join(',')}\nDoor 1,door,715,496,18,2,both,yes\nDrawer side,drawer,450,120,15,8,both,no\n`;

/**
 * Parts belong to the group's jobs; where a part stands is its rack's site's. A part on another
 * site's rack is read without its place and cannot be moved, changed or collected from here.
 */
export const partRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/jobs/parts-template.csv',
    summary: 'A cut-list CSV with the expected columns',
    access: 'jobs:read',
    sites: 'own',
    response: { status: 200, contentType: 'text/csv' },
    handler: (_input, { res }) => {
      res.attachment('boothwright-cut-list.csv').type('text/csv').send(templateCsv);
      return answered;
    },
  }),
  defineRoute({
    method: 'get',
    path: '/api/jobs/:id/parts',
    summary: 'A job’s parts (a place on another site’s rack is left out)',
    access: 'jobs:read',
    sites: 'site',
    params: idParamsSchema,
    query: partListQuerySchema,
    response: { status: 200, schema: partListSchema },
    handler: ({ params, query }, { services }) => services.parts.listForJob(params.id, query),
  }),
  defineRoute({
    method: 'post',
    path: '/api/jobs/:id/parts',
    summary: 'Add a part (on a rack of the caller’s site, or none)',
    access: 'jobs:write',
    sites: 'site',
    params: idParamsSchema,
    body: createPartSchema,
    response: { status: 201, schema: partResponseSchema },
    handler: async ({ params, body }, { services, actor }) => ({ part: await services.parts.create(params.id, body, actor) }),
  }),
  defineRoute({
    method: 'post',
    path: '/api/jobs/:id/parts/import',
    summary: 'Import a cut list from CSV (preview=true checks every row and saves nothing: 200)',
    access: 'jobs:write',
    sites: 'group',
    params: idParamsSchema,
    multipart: { fields: importFormSchema, file: { maxBytes: 2 * 1024 * 1024, description: 'The cut list, a CSV file' } },
    response: { status: 201, otherStatuses: [200], schema: importResultSchema },
    handler: async ({ params, form, file }, { services, actor }) => {
      const result = await services.partImport.importCsv(params.id, file?.buffer, form.mapping, form.preview, actor);
      return new Reply(result.saved ? 201 : 200, result);
    },
  }),
  defineRoute({
    method: 'get',
    path: '/api/parts',
    summary: 'Several parts by id (?ids=3,5,8; ids that name nothing are left out, a place on another site’s rack too)',
    access: 'jobs:read',
    sites: 'site',
    query: partIdsQuerySchema,
    response: { status: 200, schema: partListSchema },
    handler: ({ query }, { services }) => services.parts.listByIds(query.ids),
  }),
  defineRoute({
    method: 'get',
    path: '/api/parts/by-tag/:tag',
    summary: 'The part with a rack-tag code',
    access: 'jobs:read',
    sites: 'site',
    params: z.object({ tag: z.string().max(16) }),
    response: { status: 200, schema: partResponseSchema },
    handler: async ({ params }, { services }) => ({ part: await services.parts.getByTag(params.tag) }),
  }),
  defineRoute({
    method: 'get',
    path: '/api/parts/:id',
    summary: 'One part',
    access: 'jobs:read',
    sites: 'site',
    params: idParamsSchema,
    response: { status: 200, schema: partResponseSchema },
    handler: async ({ params }, { services }) => ({ part: await services.parts.get(params.id) }),
  }),
  defineRoute({
    method: 'get',
    path: '/api/parts/:id/history',
    summary: 'What a part’s rack tag opens: where it stands, its next step and times, and the caller’s site’s coats and denibs on it',
    access: 'ready:read',
    sites: 'site',
    params: idParamsSchema,
    response: { status: 200, schema: partHistoryResponseSchema },
    handler: async ({ params }, { services }) => ({ history: await services.partHistory.get(params.id) }),
  }),
  defineRoute({
    method: 'patch',
    path: '/api/parts/:id',
    summary: 'Change a part or its rack place (a rack of the caller’s site)',
    access: 'jobs:write',
    sites: 'site',
    params: idParamsSchema,
    body: updatePartSchema,
    response: { status: 200, schema: partResponseSchema },
    handler: async ({ params, body }, { services, actor }) => ({ part: await services.parts.update(params.id, body, actor) }),
  }),
  defineRoute({
    method: 'post',
    path: '/api/parts/:id/collect',
    summary: 'Mark a part collected from its rack',
    access: 'parts:collect',
    sites: 'site',
    params: idParamsSchema,
    response: { status: 200, schema: partResponseSchema },
    handler: async ({ params }, { services, actor }) => ({ part: await services.parts.setCollected(params.id, true, actor) }),
  }),
  defineRoute({
    method: 'delete',
    path: '/api/parts/:id/collect',
    summary: 'Undo a collection: the part goes back to its rack place',
    access: 'parts:collect',
    sites: 'site',
    params: idParamsSchema,
    response: { status: 200, schema: partResponseSchema },
    handler: async ({ params }, { services, actor }) => ({ part: await services.parts.setCollected(params.id, false, actor) }),
  }),
];

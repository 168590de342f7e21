import { z } from 'zod';
import { errorEnvelopeSchema } from '../shared/errors';
import type { Permission } from '../shared/permissions';
import { csrfResponseSchema, loginSchema, sessionUserSchema } from '../shared/schemas/auth';
import { boothSchema, createBoothSchema, updateBoothSchema } from '../shared/schemas/booth';
import { listSchema } from '../shared/schemas/common';
import { createRackSchema, rackSchema, updateRackSchema } from '../shared/schemas/rack';
import { shopSettingsSchema, updateShopSettingsSchema } from '../shared/schemas/settings';
import { createUserSchema, updateMeSchema, updateUserSchema, userSchema } from '../shared/schemas/user';
import { auditEntrySchema } from '../shared/schemas/audit';
import { coatSchema, correctCoatSchema, createCoatSchema } from '../shared/schemas/coat';
import { createFinishSystemSchema, finishSystemSchema } from '../shared/schemas/finish-system';
import { createJobSchema, jobSchema, updateJobSchema } from '../shared/schemas/job';
import { createPartSchema, partSchema } from '../shared/schemas/part';
import { createLotSchema, createProductSchema, lotSchema, productSchema, updateProductSchema } from '../shared/schemas/product';
import { createReadingSchema, readingSchema } from '../shared/schemas/reading';
import { readyPartSchema } from '../shared/schemas/ready';
import { createSiteSchema, siteSchema, updateSiteSchema } from '../shared/schemas/site';
import { areaSprayedReportSchema, boothUseReportSchema, conditionsReportSchema, materialReportSchema, reworkReportSchema, solventReportSchema } from '../shared/schemas/report';
import { createSpraySessionSchema, spraySessionSchema, updateSpraySessionSchema } from '../shared/schemas/spray-session';
import { sprayerListSchema } from '../shared/schemas/sprayer';
import { todayResponseSchema } from '../shared/schemas/today';

interface Operation {
  method: 'get' | 'post' | 'patch';
  path: string;
  summary: string;
  permission?: Permission | 'signed-in' | 'public';
  body?: z.ZodType;
  response?: z.ZodType;
  status?: number;
}

const wrap = (key: string, schema: z.ZodType) => z.object({ [key]: schema });

const operations: Operation[] = [
  { method: 'get', path: '/api/health', summary: 'Liveness check', permission: 'public', response: z.object({ ok: z.literal(true) }) },
  { method: 'get', path: '/api/auth/csrf', summary: 'CSRF token for mutating requests', permission: 'public', response: csrfResponseSchema },
  { method: 'post', path: '/api/auth/login', summary: 'Sign in', permission: 'public', body: loginSchema, response: wrap('user', sessionUserSchema) },
  { method: 'post', path: '/api/auth/logout', summary: 'Sign out', permission: 'signed-in', status: 204 },
  { method: 'get', path: '/api/auth/me', summary: 'The signed-in user', permission: 'signed-in', response: wrap('user', sessionUserSchema) },
  { method: 'patch', path: '/api/auth/me', summary: 'Change own name or units', permission: 'signed-in', body: updateMeSchema, response: wrap('user', sessionUserSchema) },
  { method: 'get', path: '/api/users', summary: 'List users', permission: 'users:read', response: listSchema(userSchema) },
  { method: 'post', path: '/api/users', summary: 'Create a user', permission: 'users:write', body: createUserSchema, response: wrap('user', userSchema), status: 201 },
  { method: 'patch', path: '/api/users/{id}', summary: 'Change a user', permission: 'users:write', body: updateUserSchema, response: wrap('user', userSchema) },
  { method: 'get', path: '/api/sites', summary: 'List sites', permission: 'sites:read', response: listSchema(siteSchema) },
  { method: 'post', path: '/api/sites', summary: 'Add a site', permission: 'sites:write', body: createSiteSchema, response: wrap('site', siteSchema), status: 201 },
  { method: 'get', path: '/api/sites/{id}', summary: 'One site', permission: 'sites:read', response: wrap('site', siteSchema) },
  { method: 'patch', path: '/api/sites/{id}', summary: 'Rename a site', permission: 'sites:write', body: updateSiteSchema, response: wrap('site', siteSchema) },
  { method: 'get', path: '/api/booths', summary: 'List booths (own site; an admin all, or ?siteId)', permission: 'booths:read', response: listSchema(boothSchema) },
  { method: 'post', path: '/api/booths', summary: 'Create a booth', permission: 'booths:write', body: createBoothSchema, response: wrap('booth', boothSchema), status: 201 },
  { method: 'get', path: '/api/booths/{id}', summary: 'One booth', permission: 'booths:read', response: wrap('booth', boothSchema) },
  { method: 'patch', path: '/api/booths/{id}', summary: 'Change a booth', permission: 'booths:write', body: updateBoothSchema, response: wrap('booth', boothSchema) },
  { method: 'get', path: '/api/racks', summary: 'List racks', permission: 'racks:read', response: listSchema(rackSchema) },
  { method: 'post', path: '/api/racks', summary: 'Create a rack', permission: 'racks:write', body: createRackSchema, response: wrap('rack', rackSchema), status: 201 },
  { method: 'get', path: '/api/racks/{id}', summary: 'One rack', permission: 'racks:read', response: wrap('rack', rackSchema) },
  { method: 'patch', path: '/api/racks/{id}', summary: 'Change a rack', permission: 'racks:write', body: updateRackSchema, response: wrap('rack', rackSchema) },
  { method: 'get', path: '/api/settings', summary: 'Shop settings', permission: 'settings:read', response: wrap('settings', shopSettingsSchema) },
  { method: 'patch', path: '/api/settings', summary: 'Change shop settings', permission: 'settings:write', body: updateShopSettingsSchema, response: wrap('settings', shopSettingsSchema) },
  { method: 'get', path: '/api/audit', summary: 'The audit trail, newest first', permission: 'audit:read', response: listSchema(auditEntrySchema) },
  { method: 'get', path: '/api/products', summary: 'Search data sheets', permission: 'products:read', response: listSchema(productSchema) },
  { method: 'post', path: '/api/products', summary: 'Add a data sheet', permission: 'products:write', body: createProductSchema, response: wrap('product', productSchema), status: 201 },
  { method: 'get', path: '/api/products/{id}', summary: 'One data sheet', permission: 'products:read', response: wrap('product', productSchema) },
  { method: 'patch', path: '/api/products/{id}', summary: 'Change a data sheet', permission: 'products:write', body: updateProductSchema, response: wrap('product', productSchema) },
  { method: 'post', path: '/api/products/{id}/lots', summary: 'Record a lot', permission: 'products:write', body: createLotSchema, response: wrap('lot', lotSchema), status: 201 },
  { method: 'get', path: '/api/finish-systems', summary: 'List finish systems', permission: 'finish-systems:read', response: listSchema(finishSystemSchema) },
  { method: 'post', path: '/api/finish-systems', summary: 'Add a finish system', permission: 'finish-systems:write', body: createFinishSystemSchema, response: wrap('finishSystem', finishSystemSchema), status: 201 },
  { method: 'get', path: '/api/jobs', summary: 'List jobs by due date', permission: 'jobs:read', response: listSchema(jobSchema) },
  { method: 'post', path: '/api/jobs', summary: 'Add a job', permission: 'jobs:write', body: createJobSchema, response: wrap('job', jobSchema), status: 201 },
  { method: 'get', path: '/api/jobs/{id}', summary: 'One job', permission: 'jobs:read', response: wrap('job', jobSchema) },
  { method: 'patch', path: '/api/jobs/{id}', summary: 'Change a job', permission: 'jobs:write', body: updateJobSchema, response: wrap('job', jobSchema) },
  { method: 'get', path: '/api/jobs/{id}/parts', summary: 'A job’s parts', permission: 'jobs:read', response: listSchema(partSchema) },
  { method: 'post', path: '/api/jobs/{id}/parts', summary: 'Add a part', permission: 'jobs:write', body: createPartSchema, response: wrap('part', partSchema), status: 201 },
  { method: 'get', path: '/api/spray-sessions', summary: 'Spray sessions overlapping from–to', permission: 'spray-sessions:read', response: listSchema(spraySessionSchema) },
  { method: 'post', path: '/api/spray-sessions', summary: 'Book booth time (409 when it overlaps)', permission: 'spray-sessions:write', body: createSpraySessionSchema, response: wrap('spraySession', spraySessionSchema), status: 201 },
  { method: 'patch', path: '/api/spray-sessions/{id}', summary: 'Move, resize or progress a session', permission: 'spray-sessions:run', body: updateSpraySessionSchema, response: wrap('spraySession', spraySessionSchema) },
  { method: 'get', path: '/api/sprayers', summary: 'Active sprayers and leads who can be given a session (?boothId: that booth’s site)', permission: 'spray-sessions:read', response: sprayerListSchema },
  { method: 'get', path: '/api/today', summary: 'The day’s board for the caller’s role: a lead’s sessions, unassigned work, closing windows, denibs, jobs at risk and stale sensors; a sprayer’s sessions with their next step (?siteId for an admin)', permission: 'today:read', response: todayResponseSchema },
  { method: 'post', path: '/api/coats', summary: 'Record a coat', permission: 'coats:write', body: createCoatSchema, response: wrap('coat', coatSchema), status: 201 },
  { method: 'get', path: '/api/coats', summary: 'The coat log', permission: 'coats:read', response: listSchema(coatSchema) },
  { method: 'post', path: '/api/coats/{id}/corrections', summary: 'Correct a coat (a new version)', permission: 'coats:write', body: correctCoatSchema, response: wrap('coat', coatSchema), status: 201 },
  { method: 'get', path: '/api/ready', summary: 'Part readiness', permission: 'ready:read', response: z.object({ items: z.array(readyPartSchema) }) },
  { method: 'post', path: '/api/readings', summary: 'Record conditions (session or booth sensor bearer token)', permission: 'readings:write', body: createReadingSchema, response: wrap('reading', readingSchema), status: 201 },
  { method: 'get', path: '/api/events', summary: 'Server-sent change events', permission: 'signed-in' },
  // Reports take ?from=YYYY-MM-DD&to=YYYY-MM-DD (shop dates, both included) and &format=csv for the table as CSV.
  { method: 'get', path: '/api/reports/booth-use', summary: 'Hours booked and sprayed per booth per week (?boothId)', permission: 'reports:read', response: boothUseReportSchema },
  { method: 'get', path: '/api/reports/area-sprayed', summary: 'Area sprayed per week (?groupBy=product-kind|job)', permission: 'reports:read', response: areaSprayedReportSchema },
  { method: 'get', path: '/api/reports/conditions', summary: 'Booth conditions against product limits (?boothId)', permission: 'reports:read', response: conditionsReportSchema },
  { method: 'get', path: '/api/reports/solvent', summary: 'Litres mixed and VOC per month with the yearly total', permission: 'reports:read', response: solventReportSchema },
  { method: 'get', path: '/api/reports/material', summary: 'Litres used against the estimate per job and product (?jobId)', permission: 'reports:read', response: materialReportSchema },
  { method: 'get', path: '/api/reports/rework', summary: 'Coats corrected or re-sprayed by reason per month', permission: 'reports:read', response: reworkReportSchema },
];

const jsonSchema = (schema: z.ZodType, io: 'input' | 'output') => z.toJSONSchema(schema, { io, unrepresentable: 'any' });

function toOperation(op: Operation) {
  const status = String(op.status ?? 200);
  const errorResponse = { description: 'Error envelope', content: { 'application/json': { schema: jsonSchema(errorEnvelopeSchema, 'output') } } };
  return {
    summary: op.summary,
    'x-permission': op.permission ?? 'signed-in',
    ...(op.path.includes('{id}') ? { parameters: [{ name: 'id', in: 'path', required: true, schema: { type: 'integer' } }] } : {}),
    ...(op.body ? { requestBody: { required: true, content: { 'application/json': { schema: jsonSchema(op.body, 'input') } } } } : {}),
    responses: {
      [status]: op.response ? { description: 'Success', content: { 'application/json': { schema: jsonSchema(op.response, 'output') } } } : { description: 'Success' },
      default: errorResponse,
    },
  };
}

/** Generated from the shared zod schemas, so it cannot drift from what the routes parse. */
export function buildOpenApiDocument() {
  const paths: Record<string, Record<string, unknown>> = {};
  for (const op of operations) (paths[op.path] ??= {})[op.method] = toOperation(op);
  return {
    openapi: '3.1.0',
    info: { title: 'Boothwright API', version: '0.1.0', description: 'Session-cookie auth; mutating requests carry x-csrf-token from GET /api/auth/csrf.' },
    paths,
  };
}

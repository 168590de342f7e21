import { z } from 'zod';
import { errorEnvelopeSchema } from '../shared/errors';
import type { Permission } from '../shared/permissions';
import { csrfResponseSchema, loginSchema, sessionUserSchema } from '../shared/schemas/auth';
import { boothSchema, createBoothSchema, updateBoothSchema } from '../shared/schemas/booth';
import { listSchema } from '../shared/schemas/common';
import { createRackSchema, rackSchema, updateRackSchema } from '../shared/schemas/rack';
import { shopSettingsSchema, updateShopSettingsSchema } from '../shared/schemas/settings';
import { createUserSchema, updateMeSchema, updateUserSchema, userSchema } from '../shared/schemas/user';

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
  { method: 'get', path: '/api/booths', summary: 'List booths', permission: 'booths:read', response: listSchema(boothSchema) },
  { method: 'post', path: '/api/booths', summary: 'Create a booth', permission: 'booths:write', body: createBoothSchema, response: wrap('booth', boothSchema), status: 201 },
  { method: 'get', path: '/api/booths/{id}', summary: 'One booth', permission: 'booths:read', response: wrap('booth', boothSchema) },
  { method: 'patch', path: '/api/booths/{id}', summary: 'Change a booth', permission: 'booths:write', body: updateBoothSchema, response: wrap('booth', boothSchema) },
  { method: 'get', path: '/api/racks', summary: 'List racks', permission: 'racks:read', response: listSchema(rackSchema) },
  { method: 'post', path: '/api/racks', summary: 'Create a rack', permission: 'racks:write', body: createRackSchema, response: wrap('rack', rackSchema), status: 201 },
  { method: 'get', path: '/api/racks/{id}', summary: 'One rack', permission: 'racks:read', response: wrap('rack', rackSchema) },
  { method: 'patch', path: '/api/racks/{id}', summary: 'Change a rack', permission: 'racks:write', body: updateRackSchema, response: wrap('rack', rackSchema) },
  { method: 'get', path: '/api/settings', summary: 'Shop settings', permission: 'settings:read', response: wrap('settings', shopSettingsSchema) },
  { method: 'patch', path: '/api/settings', summary: 'Change shop settings', permission: 'settings:write', body: updateShopSettingsSchema, response: wrap('settings', shopSettingsSchema) },
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

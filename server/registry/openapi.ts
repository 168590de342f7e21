import { z } from 'zod';
import { errorEnvelopeSchema } from '../../shared/errors';
import { signInCookieName } from '../middleware/sign-in-session';
import type { ApiRoute } from './route';

const jsonSchema = (schema: z.ZodType, io: 'input' | 'output') => z.toJSONSchema(schema, { io, unrepresentable: 'any' });

/** `/api/coats/:id` → `/api/coats/{id}` */
export const openApiPath = (path: string) => path.replace(/:(\w+)/g, '{$1}');

const accessText = (route: ApiRoute) => (typeof route.access === 'object' ? `${route.access.sensorOr} or a booth sensor token` : route.access);

function parameters(route: ApiRoute) {
  const described = (location: 'path' | 'query', shape: Record<string, z.ZodType>) =>
    Object.entries(shape).map(([name, schema]) => ({
      name,
      in: location,
      required: location === 'path' || !schema.safeParse(undefined).success,
      schema: jsonSchema(schema, 'input'),
    }));
  return [...described('path', route.params?.shape ?? {}), ...described('query', route.query?.shape ?? {})];
}

function requestBody(route: ApiRoute) {
  if (route.body) return { required: true, content: { 'application/json': { schema: jsonSchema(route.body, 'input') } } };
  if (!route.multipart) return undefined;
  const fields = jsonSchema(route.multipart.fields, 'input') as { properties?: Record<string, unknown>; required?: string[] };
  const file = { type: 'string', format: 'binary', description: `${route.multipart.file.description}, at most ${Math.round(route.multipart.file.maxBytes / 1024 / 1024)} MB` };
  const schema = { type: 'object', properties: { ...fields.properties, file }, required: [...(fields.required ?? []), 'file'] };
  return { required: true, content: { 'multipart/form-data': { schema } } };
}

function success(route: ApiRoute) {
  const { response } = route;
  if (response.status === 204) return { description: response.description ?? 'Done; no body' };
  if (response.contentType) return { description: response.description ?? 'Success', content: { [response.contentType]: { schema: { type: 'string' } } } };
  const content = response.schema ? { content: { 'application/json': { schema: jsonSchema(response.schema, 'output') } } } : {};
  return { description: response.description ?? 'Success', ...content };
}

function toOperation(route: ApiRoute) {
  const ok = success(route);
  const statuses = [route.response.status, ...(route.response.otherStatuses ?? [])];
  const body = requestBody(route);
  return {
    summary: route.summary,
    'x-permission': accessText(route),
    'x-sites': route.sites,
    ...(typeof route.access === 'object' ? { security: [{ signIn: [] }, { sensorToken: [] }] } : {}),
    parameters: parameters(route),
    ...(body ? { requestBody: body } : {}),
    responses: {
      ...Object.fromEntries(statuses.map((status) => [String(status), ok])),
      default: { description: 'Error envelope', content: { 'application/json': { schema: jsonSchema(errorEnvelopeSchema, 'output') } } },
    },
  };
}

/** Generated from the route registry and its shared zod schemas, so it cannot drift from what the routes parse. */
export function buildOpenApiDocument(routes: ApiRoute[]) {
  const paths: Record<string, Record<string, unknown>> = {};
  for (const route of routes) (paths[openApiPath(route.path)] ??= {})[route.method] = toOperation(route);
  return {
    openapi: '3.1.0',
    info: {
      title: 'Boothwright API',
      version: '0.2.0',
      description:
        'Sign-in session cookie; mutating requests carry x-csrf-token from GET /api/auth/csrf. x-permission names what a role needs; x-sites says whether the answer is one site’s (site), the whole group’s (group) or only the caller’s own (own). Query parameters a route does not list are refused with 400.',
    },
    components: {
      securitySchemes: {
        signIn: { type: 'apiKey', in: 'cookie', name: signInCookieName },
        sensorToken: { type: 'http', scheme: 'bearer', description: 'A booth sensor’s token, from POST /api/booths/{id}/sensor-token' },
      },
    },
    paths,
  };
}

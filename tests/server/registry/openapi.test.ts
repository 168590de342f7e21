import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { apiRoutes } from '../../../server/registry/api-routes';
import { startTestApp, type TestContext } from '../../helpers/test-app';
import { registeredRoutes, routeKey } from '../security/route-table';

interface Parameter {
  name: string;
  in: 'path' | 'query';
  required: boolean;
}
interface Operation {
  summary: string;
  'x-permission': string;
  'x-sites': string;
  parameters: Parameter[];
  requestBody?: { content: Record<string, { schema: { properties?: Record<string, { format?: string }>; required?: string[] } }> };
  responses: Record<string, unknown>;
}
type Document = { openapi: string; paths: Record<string, Record<string, Operation>> };

let ctx: TestContext;
let doc: Document;

beforeAll(async () => {
  ctx = await startTestApp({ seed: false });
  doc = (await request(ctx.app).get('/api/openapi.json').expect(200)).body as Document;
});
afterAll(async () => ctx.close());

const operation = (method: string, path: string) => doc.paths[path]?.[method];

describe('GET /api/openapi.json', () => {
  it('documents every route the app answers', () => {
    const documented = Object.entries(doc.paths).flatMap(([path, ops]) => Object.keys(ops).map((method) => routeKey(method, path.replace(/\{(\w+)\}/g, ':$1'))));
    const mounted = registeredRoutes(ctx.app);
    expect(mounted.length).toBeGreaterThan(60);
    expect(mounted.filter((key) => !documented.includes(key)), 'mounted but not documented').toEqual([]);
    expect(documented.filter((key) => !mounted.includes(key)), 'documented but not mounted').toEqual([]);
  });

  it('gives every operation its permission, its site reach, a success answer and the error envelope', () => {
    for (const [path, ops] of Object.entries(doc.paths)) {
      for (const [method, op] of Object.entries(ops)) {
        expect(op.summary, `${method} ${path}`).toBeTruthy();
        expect(op['x-permission'], `${method} ${path}`).toBeTruthy();
        expect(['site', 'group', 'own'], `${method} ${path}`).toContain(op['x-sites']);
        expect(Object.keys(op.responses).some((status) => /^2\d\d$/.test(status)), `${method} ${path}`).toBe(true);
        expect(op.responses.default, `${method} ${path}`).toBeTruthy();
      }
    }
  });

  it('lists each route’s path and query parameters as its schemas declare them', () => {
    for (const route of apiRoutes) {
      const op = operation(route.method, route.path.replace(/:(\w+)/g, '{$1}'))!;
      const names = (where: 'path' | 'query') => op.parameters.filter((p) => p.in === where).map((p) => p.name).sort();
      expect(names('path'), route.path).toEqual(Object.keys(route.params?.shape ?? {}).sort());
      expect(names('query'), route.path).toEqual(Object.keys(route.query?.shape ?? {}).sort());
    }
    const coats = operation('get', '/api/coats')!;
    expect(coats.parameters.map((p) => p.name)).toEqual(expect.arrayContaining(['spraySessionId', 'jobId', 'from', 'to', 'history', 'page', 'pageSize']));
    const conditions = operation('get', '/api/reports/conditions')!;
    expect(conditions.parameters.filter((p) => p.required).map((p) => p.name).sort()).toEqual(['boothId', 'from', 'to']);
  });

  it('describes the uploads as multipart forms with their file', () => {
    for (const [method, path, field] of [
      ['post', '/api/jobs/{id}/parts/import', 'mapping'],
      ['post', '/api/products/{id}/documents', 'kind'],
    ]) {
      const form = operation(method, path)!.requestBody!.content['multipart/form-data'].schema;
      expect(form.properties?.file?.format, path).toBe('binary');
      expect(form.required, path).toContain('file');
      expect(Object.keys(form.properties ?? {}), path).toContain(field);
    }
  });
});

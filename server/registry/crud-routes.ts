import { z } from 'zod';
import type { Permission } from '../../shared/permissions';
import { idParamsSchema, listSchema, type List } from '../../shared/schemas/common';
import type { Actor } from '../services/audit';
import type { ServiceSet } from '../services/service-set';
import { defineRoute, type ApiRoute, type SiteReach } from './route';

interface CrudService<D> {
  list(query: never): Promise<List<D>>;
  get(id: number): Promise<D>;
  create(input: never, actor: Actor): Promise<D>;
  update(id: number, patch: never, actor: Actor): Promise<D>;
}

export interface CrudRouteOptions {
  /** `/api/booths` */
  path: string;
  /** The key one item is wrapped in: `{ booth: … }`. */
  resource: string;
  /** The word in the summaries: "booth". */
  noun: string;
  read: Permission;
  write: Permission;
  sites: SiteReach;
  listQuery: z.ZodObject;
  createSchema: z.ZodType;
  updateSchema: z.ZodType;
  itemSchema: z.ZodType;
  service: (services: ServiceSet) => CrudService<unknown>;
}

/** GET list, POST, GET one and PATCH for a piece of master data (sites, booths, racks, finish systems). */
export function crudRoutes(o: CrudRouteOptions): ApiRoute[] {
  const one = z.object({ [o.resource]: o.itemSchema });
  return [
    defineRoute({
      method: 'get',
      path: o.path,
      summary: `List ${o.noun}s`,
      access: o.read,
      sites: o.sites,
      query: o.listQuery,
      response: { status: 200, schema: listSchema(o.itemSchema) },
      handler: ({ query }, { services }) => o.service(services).list(query as never),
    }),
    defineRoute({
      method: 'post',
      path: o.path,
      summary: `Add a ${o.noun}`,
      access: o.write,
      sites: o.sites,
      body: o.createSchema,
      response: { status: 201, schema: one },
      handler: async ({ body }, { services, actor }) => ({ [o.resource]: await o.service(services).create(body as never, actor) }),
    }),
    defineRoute({
      method: 'get',
      path: `${o.path}/:id`,
      summary: `One ${o.noun}`,
      access: o.read,
      sites: o.sites,
      params: idParamsSchema,
      response: { status: 200, schema: one },
      handler: async ({ params }, { services }) => ({ [o.resource]: await o.service(services).get(params.id) }),
    }),
    defineRoute({
      method: 'patch',
      path: `${o.path}/:id`,
      summary: `Change a ${o.noun}`,
      access: o.write,
      sites: o.sites,
      params: idParamsSchema,
      body: o.updateSchema,
      response: { status: 200, schema: one },
      handler: async ({ params, body }, { services, actor }) => ({ [o.resource]: await o.service(services).update(params.id, body as never, actor) }),
    }),
  ];
}

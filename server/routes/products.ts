import { z } from 'zod';
import { idParamsSchema } from '../../shared/schemas/common';
import { createLotSchema, createProductSchema, documentKindSchema, lotResponseSchema, productListQuerySchema, productListSchema, productResponseSchema, updateProductSchema } from '../../shared/schemas/product';
import { defineRoute, type ApiRoute } from '../registry/route';
import { maxUploadBytes } from '../services/files';

/** Data sheets, their lots and documents are the group's: every site sprays from the same sheets. */
export const productRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/products',
    summary: 'Search data sheets',
    access: 'products:read',
    sites: 'group',
    query: productListQuerySchema,
    response: { status: 200, schema: productListSchema },
    handler: ({ query }, { services }) => services.products.list(query),
  }),
  defineRoute({
    method: 'post',
    path: '/api/products',
    summary: 'Add a data sheet',
    access: 'products:write',
    sites: 'group',
    body: createProductSchema,
    response: { status: 201, schema: productResponseSchema },
    handler: async ({ body }, { services, actor }) => ({ product: await services.products.create(body, actor) }),
  }),
  defineRoute({
    method: 'get',
    path: '/api/products/:id',
    summary: 'One data sheet',
    access: 'products:read',
    sites: 'group',
    params: idParamsSchema,
    response: { status: 200, schema: productResponseSchema },
    handler: async ({ params }, { services }) => ({ product: await services.products.get(params.id) }),
  }),
  defineRoute({
    method: 'patch',
    path: '/api/products/:id',
    summary: 'Change a data sheet',
    access: 'products:write',
    sites: 'group',
    params: idParamsSchema,
    body: updateProductSchema,
    response: { status: 200, schema: productResponseSchema },
    handler: async ({ params, body }, { services, actor }) => ({ product: await services.products.update(params.id, body, actor) }),
  }),
  defineRoute({
    method: 'post',
    path: '/api/products/:id/lots',
    summary: 'Record a lot',
    access: 'products:write',
    sites: 'group',
    params: idParamsSchema,
    body: createLotSchema,
    response: { status: 201, schema: lotResponseSchema },
    handler: async ({ params, body }, { services, actor }) => ({ lot: await services.products.addLot(params.id, body, actor) }),
  }),
  defineRoute({
    method: 'post',
    path: '/api/products/:id/documents',
    summary: 'Attach a technical (tds) or safety (sds) data sheet PDF',
    access: 'products:write',
    sites: 'group',
    params: idParamsSchema,
    multipart: { fields: z.object({ kind: documentKindSchema }), file: { maxBytes: maxUploadBytes, description: 'The data sheet, a PDF' } },
    response: { status: 201, schema: productResponseSchema },
    handler: async ({ params, form, file }, { services, actor }) => ({ product: await services.products.attachDocument(params.id, form.kind, file, actor) }),
  }),
];

import { pipeline } from 'node:stream/promises';
import { idParamsSchema } from '../../shared/schemas/common';
import { answered, defineRoute, type ApiRoute } from '../registry/route';

/** Uploaded data sheets belong to products, which the group shares. */
export const fileRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/files/:id',
    summary: 'Download an uploaded data sheet (whoever may read data sheets)',
    access: 'products:read',
    sites: 'group',
    params: idParamsSchema,
    response: { status: 200, contentType: 'application/pdf', description: 'The file as uploaded' },
    handler: async ({ params }, { services, req, res }) => {
      const { file, content } = await services.files.open(params.id);
      res.attachment(file.originalName).type(file.mimeType).set('Cache-Control', 'private, no-store');
      if (content.sizeBytes !== undefined) res.set('Content-Length', String(content.sizeBytes));
      // The headers are gone once bytes flow: a failure now can only cut the download short.
      await pipeline(content.body, res).catch((error: Error) => req.log.warn({ err: error, fileId: file.id }, 'file download cut short'));
      return answered;
    },
  }),
];

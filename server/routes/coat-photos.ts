import { pipeline } from 'node:stream/promises';
import {
  addCoatPhotoFieldsSchema,
  coatPhotoListSchema,
  coatPhotoQuerySchema,
  coatPhotoResponseSchema,
} from '../../shared/schemas/coat-photo';
import { idParamsSchema } from '../../shared/schemas/common';
import { answered, defineRoute, type ApiRoute } from '../registry/route';
import { maxPhotoBytes } from '../services/coat-photos';

/** Photos of coats belong to the coat's site, like the coat log. */
export const coatPhotoRoutes: ApiRoute[] = [
  defineRoute({
    method: 'post',
    path: '/api/coats/:id/photos',
    summary:
      'Add a photo to a coat (a defect, a sample board): JPEG, PNG or WebP up to 10 MB; its own record, the coat never changes',
    access: 'coats:write',
    sites: 'site',
    params: idParamsSchema,
    multipart: {
      fields: addCoatPhotoFieldsSchema,
      file: { maxBytes: maxPhotoBytes, description: 'The photo: JPEG, PNG or WebP' },
    },
    response: { status: 201, schema: coatPhotoResponseSchema },
    handler: async ({ params, form, file }, { services, runner }) => ({
      photo: await services.coatPhotos.add(params.id, form, file, runner),
    }),
  }),
  defineRoute({
    method: 'get',
    path: '/api/coat-photos',
    summary: 'The photos of these coats and of the versions each corrects (?coatIds=12,13)',
    access: 'coats:read',
    sites: 'site',
    query: coatPhotoQuerySchema,
    response: { status: 200, schema: coatPhotoListSchema },
    handler: async ({ query }, { services }) => ({ items: await services.coatPhotos.forCoats(query.coatIds) }),
  }),
  defineRoute({
    method: 'get',
    path: '/api/coat-photos/:id',
    summary: 'One photo, full size',
    access: 'coats:read',
    sites: 'site',
    params: idParamsSchema,
    response: { status: 200, contentType: 'image/jpeg', description: 'The photo as uploaded (JPEG, PNG or WebP)' },
    handler: async ({ params }, { services, req, res }) => {
      const { photo, content } = await services.coatPhotos.open(params.id);
      res
        .type(photo.mimeType)
        .set('Cache-Control', 'private, max-age=86400, immutable')
        .set('Content-Disposition', `inline; filename="coat-${photo.coatId}-photo-${photo.id}"`);
      if (content.sizeBytes !== undefined) res.set('Content-Length', String(content.sizeBytes));
      await pipeline(content.body, res).catch((error: Error) =>
        req.log.warn({ err: error, photoId: photo.id }, 'photo download cut short'),
      );
      return answered;
    },
  }),
];

import { pipeline } from 'node:stream/promises';
import { Router } from 'express';
import { z } from 'zod';
import { idParamsSchema } from '../../shared/schemas/common';
import { createLotSchema, createProductSchema, documentKindSchema, productListQuerySchema, updateProductSchema } from '../../shared/schemas/product';
import { actorOf } from '../lib/actor';
import { requirePermission } from '../middleware/permissions';
import { singleUpload } from '../middleware/upload';
import { maxUploadBytes, type FileService } from '../services/files';
import type { ProductService } from '../services/products';

export function productRoutes(products: ProductService): Router {
  const router = Router();

  router.get('/', requirePermission('products:read'), async (req, res) => {
    res.json(await products.list(productListQuerySchema.parse(req.query)));
  });

  router.post('/', requirePermission('products:write'), async (req, res) => {
    res.status(201).json({ product: await products.create(createProductSchema.parse(req.body), actorOf(req)) });
  });

  router.get('/:id', requirePermission('products:read'), async (req, res) => {
    res.json({ product: await products.get(idParamsSchema.parse(req.params).id) });
  });

  router.patch('/:id', requirePermission('products:write'), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json({ product: await products.update(id, updateProductSchema.parse(req.body), actorOf(req)) });
  });

  router.post('/:id/lots', requirePermission('products:write'), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.status(201).json({ lot: await products.addLot(id, createLotSchema.parse(req.body), actorOf(req)) });
  });

  router.post('/:id/documents', requirePermission('products:write'), singleUpload(maxUploadBytes), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const { kind } = z.object({ kind: documentKindSchema }).parse(req.body ?? {});
    res.status(201).json({ product: await products.attachDocument(id, kind, req.file, actorOf(req)) });
  });

  return router;
}

export function fileRoutes(files: FileService): Router {
  const router = Router();
  router.get('/:id', requirePermission('products:read'), async (req, res) => {
    const { file, content } = await files.open(idParamsSchema.parse(req.params).id);
    res.attachment(file.originalName).type(file.mimeType).set('Cache-Control', 'private, no-store');
    if (content.sizeBytes !== undefined) res.set('Content-Length', String(content.sizeBytes));
    // The headers are gone once bytes flow: a failure now can only cut the download short.
    await pipeline(content.body, res).catch((error: Error) => req.log.warn({ err: error, fileId: file.id }, 'file download cut short'));
  });
  return router;
}

import { Router } from 'express';
import { z } from 'zod';
import { idParamsSchema } from '../../shared/schemas/common';
import { createLotSchema, createProductSchema, documentKindSchema, productListQuerySchema, updateProductSchema } from '../../shared/schemas/product';
import { AppError } from '../lib/app-error';
import { actorOf } from '../lib/actor';
import { requirePermission, requireSignIn } from '../middleware/permissions';
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
  router.get('/:id', requireSignIn, async (req, res, next) => {
    const { absolutePath, file } = await files.locate(idParamsSchema.parse(req.params).id);
    res.type(file.mimeType);
    res.download(absolutePath, file.originalName, { headers: { 'Cache-Control': 'private, no-store' } }, (error) => {
      if (error && !res.headersSent) next(new AppError('not_found', 'The file is recorded but missing from the upload folder'));
    });
  });
  return router;
}

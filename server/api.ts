import { Router } from 'express';
import type passport from 'passport';
import type { DataSource } from 'typeorm';
import { createBoothSchema, updateBoothSchema } from '../shared/schemas/booth';
import { createFinishSystemSchema, updateFinishSystemSchema } from '../shared/schemas/finish-system';
import { createRackSchema, updateRackSchema } from '../shared/schemas/rack';
import type { AppConfig } from './config/env';
import type { Clock } from './lib/clock';
import { apiNotFound } from './middleware/error-handler';
import { authRoutes } from './routes/auth';
import { jobRoutes, partRoutes } from './routes/jobs';
import { masterDataRoutes } from './routes/master-data';
import { fileRoutes, productRoutes } from './routes/products';
import { auditRoutes, settingsRoutes } from './routes/settings';
import { userRoutes } from './routes/users';
import { createBoothService } from './services/booths';
import { createEstimateService } from './services/estimates';
import { createFileService } from './services/files';
import { createFinishSystemService } from './services/finish-systems';
import { createJobService } from './services/jobs';
import { createPartImportService } from './services/part-import';
import { createPartService } from './services/parts';
import { createProductService } from './services/products';
import { createRackService } from './services/racks';
import { createSettingsService } from './services/settings';
import { createUserService } from './services/users';

/** Every /api route behind sign-in and CSRF, wired to its service. */
export function buildApiRouter(dataSource: DataSource, config: AppConfig, clock: Clock, auth: passport.PassportStatic): Router {
  const api = Router();
  const users = createUserService(dataSource, clock);
  const settings = createSettingsService(dataSource, clock);
  const files = createFileService(dataSource, config.uploadDir, clock);
  const parts = createPartService(dataSource, clock);

  api.use('/auth', authRoutes(auth, users, config.loginRateLimit));
  api.use('/users', userRoutes(users));
  api.use('/booths', masterDataRoutes({ resource: 'booth', read: 'booths:read', write: 'booths:write', createSchema: createBoothSchema, updateSchema: updateBoothSchema, service: createBoothService(dataSource, clock) }));
  api.use('/racks', masterDataRoutes({ resource: 'rack', read: 'racks:read', write: 'racks:write', createSchema: createRackSchema, updateSchema: updateRackSchema, service: createRackService(dataSource, clock) }));
  api.use('/settings', settingsRoutes(settings));
  api.use('/audit', auditRoutes(dataSource));
  api.use('/products', productRoutes(createProductService(dataSource, files, settings, clock)));
  api.use('/files', fileRoutes(files));
  api.use('/finish-systems', masterDataRoutes({ resource: 'finishSystem', read: 'finish-systems:read', write: 'finish-systems:write', createSchema: createFinishSystemSchema, updateSchema: updateFinishSystemSchema, service: createFinishSystemService(dataSource, clock) }));
  api.use('/jobs', jobRoutes(createJobService(dataSource, clock), parts, createPartImportService(dataSource, parts), createEstimateService(dataSource)));
  api.use('/parts', partRoutes(parts));
  api.use(apiNotFound);
  return api;
}

import { z } from 'zod';
import { auditRoutes } from '../routes/audit';
import { authRoutes } from '../routes/auth';
import { boothRoutes } from '../routes/booths';
import { coatRoutes } from '../routes/coats';
import { denibRoutes } from '../routes/denibs';
import { eventRoutes } from '../routes/events';
import { fileRoutes } from '../routes/files';
import { finishSystemRoutes } from '../routes/finish-systems';
import { jobRoutes } from '../routes/jobs';
import { metaRoutes } from '../routes/meta';
import { notificationRoutes } from '../routes/notifications';
import { partRoutes } from '../routes/parts';
import { plannerRoutes } from '../routes/planner';
import { productRoutes } from '../routes/products';
import { rackRoutes } from '../routes/racks';
import { readingRoutes } from '../routes/readings';
import { readyRoutes } from '../routes/ready';
import { reportRoutes } from '../routes/reports';
import { settingsRoutes } from '../routes/settings';
import { siteRoutes } from '../routes/sites';
import { sprayerRoutes } from '../routes/sprayers';
import { spraySessionRoutes } from '../routes/spray-sessions';
import { todayRoutes } from '../routes/today';
import { userRoutes } from '../routes/users';
import { coatPhotoRoutes } from '../routes/coat-photos';
import { crewRoutes } from '../routes/crew';
import { upkeepRoutes } from '../routes/upkeep';
import { buildOpenApiDocument } from './openapi';
import { defineRoute, type ApiRoute } from './route';

let document: ReturnType<typeof buildOpenApiDocument> | undefined;

const openApiRoute = defineRoute({
  method: 'get',
  path: '/api/openapi.json',
  summary: 'This API document, generated from the route registry',
  access: 'public',
  sites: 'own',
  bare: true,
  response: { status: 200, schema: z.object({ openapi: z.string(), paths: z.record(z.string(), z.unknown()) }) },
  handler: () => (document ??= buildOpenApiDocument(apiRoutes)),
});

/**
 * Every /api route, declared once: `server/api.ts` mounts them, the OpenAPI document is generated
 * from them, and the role and site matrix tests read them. A new resource's route file goes here.
 */
export const apiRoutes: ApiRoute[] = [
  ...metaRoutes,
  openApiRoute,
  ...authRoutes,
  ...userRoutes,
  ...siteRoutes,
  ...boothRoutes,
  ...rackRoutes,
  ...settingsRoutes,
  ...auditRoutes,
  ...productRoutes,
  ...fileRoutes,
  ...finishSystemRoutes,
  ...jobRoutes,
  ...partRoutes,
  ...sprayerRoutes,
  ...spraySessionRoutes,
  ...plannerRoutes,
  ...todayRoutes,
  ...coatRoutes,
  ...denibRoutes,
  ...readyRoutes,
  ...readingRoutes,
  ...eventRoutes,
  ...notificationRoutes,
  ...reportRoutes,
  ...upkeepRoutes,
  ...crewRoutes,
  ...coatPhotoRoutes,
];

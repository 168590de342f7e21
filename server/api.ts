import { Router } from 'express';
import { openSiteData } from './data/site-data';
import { everySite } from './lib/site-scope';
import { requireCsrf } from './middleware/csrf';
import { apiNotFound } from './middleware/error-handler';
import { sensorAuth } from './middleware/sensor-auth';
import { apiRoutes } from './registry/api-routes';
import { mountRoutes, type RegistryDeps } from './registry/mount';
import { createReadingService } from './services/readings';

/** The routes answered before the sign-in session is read: health and the API document. */
export function buildBareApiRouter(deps: RegistryDeps): Router {
  const router = Router();
  mountRoutes(
    router,
    apiRoutes.filter((route) => route.bare),
    deps,
  );
  return router;
}

/**
 * Every other /api route, mounted from the registry behind, in this order: a booth sensor's
 * bearer token, the CSRF check, then each route's own sign-in limit, access check and upload.
 */
export function buildApiRouter(deps: RegistryDeps): Router {
  const router = Router();
  // A token names its booth whatever the site, so it is looked up across every site.
  const sensors = createReadingService(openSiteData(deps.dataSource, everySite), deps.services.events, deps.services.clock);
  const sensorPaths = new Set(apiRoutes.filter((route) => typeof route.access === 'object' && route.method === 'post').map((route) => route.path.replace(/^\/api/, '')));
  router.use(sensorAuth(sensors.boothForToken, sensorPaths), requireCsrf);
  mountRoutes(
    router,
    apiRoutes.filter((route) => !route.bare),
    deps,
  );
  router.use(apiNotFound);
  return router;
}

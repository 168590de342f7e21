import 'express-session';
import type { Logger } from 'pino';
import type { SignedInUser } from '../shared/schemas/auth';
import type { SensorBooth } from './services/readings';

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
  }
}

declare global {
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SignedInUser {}
    interface Request {
      /** Set when a booth's sensor posts with its bearer token instead of a sign-in. */
      sensorBooth?: SensorBooth;
      /** The caller's `x-request-id` or one of our own (server/middleware/request-log.ts). */
      id: string;
      /** This request's logger, carrying its id. */
      log: Logger;
    }
  }
}

import { TypeormStore } from 'connect-typeorm';
import session from 'express-session';
import type { RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import { SessionEntity } from '../db/entities/session.entity';

export const sessionCookieName = 'bw.sid';
const twelveHours = 12 * 60 * 60 * 1000;

/** Sessions live in the database (connect-typeorm), so sign-ins survive a restart and work on any instance. */
export function sessionMiddleware(dataSource: DataSource, secret: string, behindHttpsProxy: boolean): RequestHandler {
  const store = new TypeormStore({ cleanupLimit: 2, ttl: twelveHours / 1000 }).connect(dataSource.getRepository(SessionEntity));
  return session({
    name: sessionCookieName,
    secret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: behindHttpsProxy ? 'auto' : false, maxAge: twelveHours },
  });
}

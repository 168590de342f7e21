import { TypeormStore } from 'connect-typeorm';
import expressSession from 'express-session';
import type { RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import { SignInSessionEntity } from '../db/entities/sign-in-session.entity';

/** The cookie that carries the sign-in session (not a spray session). */
export const signInCookieName = 'bw.sid';
const twelveHours = 12 * 60 * 60 * 1000;

const touchEveryMs = 5 * 60 * 1000;
const touchMemoryLimit = 20_000;

/**
 * A rolling session is re-saved with a later expiry on every request; that is a database write
 * for every read a board makes. Writing it at most every few minutes per session keeps the
 * twelve-hour sliding expiry (to within those minutes) and spares the database. (The store's own
 * touch also answers its callback twice when the cookie has an expiry; this one answers once.)
 */
function throttleTouch(store: TypeormStore, dataSource: DataSource): TypeormStore {
  const touchedAt = new Map<string, number>();
  store.touch = (sid, signInSession, callback) => {
    const now = Date.now();
    if (now - (touchedAt.get(sid) ?? 0) < touchEveryMs) return callback?.();
    if (touchedAt.size >= touchMemoryLimit) touchedAt.clear();
    touchedAt.set(sid, now);
    const expiredAt = now + (signInSession.cookie?.maxAge ?? twelveHours);
    dataSource.getRepository(SignInSessionEntity).update({ id: sid }, { expiredAt }).then(
      () => callback?.(),
      (error: Error) => callback?.(error),
    );
  };
  return store;
}

/** Sign-in sessions live in the database (connect-typeorm), so sign-ins survive a restart and work on any instance. */
export function signInSessionMiddleware(dataSource: DataSource, secret: string, behindHttpsProxy: boolean): RequestHandler {
  const store = throttleTouch(new TypeormStore({ cleanupLimit: 2, ttl: twelveHours / 1000 }).connect(dataSource.getRepository(SignInSessionEntity)), dataSource);
  return expressSession({
    name: signInCookieName,
    secret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: behindHttpsProxy ? 'auto' : false, maxAge: twelveHours },
  });
}

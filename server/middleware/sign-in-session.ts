import { TypeormStore } from 'connect-typeorm';
import expressSession from 'express-session';
import type { RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import type { SignInCache } from '../auth/sign-in-cache';
import { fastRead } from '../db/fast-read';
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
function throttleTouch(store: TypeormStore, dataSource: DataSource, cache: SignInCache): void {
  const touchedAt = new Map<string, number>();
  store.touch = (sid, signInSession, callback) => {
    const now = Date.now();
    if (now - (touchedAt.get(sid) ?? 0) < touchEveryMs) return callback?.();
    if (touchedAt.size >= touchMemoryLimit) touchedAt.clear();
    touchedAt.set(sid, now);
    const expiredAt = now + (signInSession.cookie?.maxAge ?? twelveHours);
    dataSource.getRepository(SignInSessionEntity).update({ id: sid }, { expiredAt }).then(
      () => {
        const held = cache.sessions.get(sid);
        if (held) cache.sessions.set(sid, { ...held, expiredAt });
        callback?.();
      },
      (error: Error) => callback?.(error),
    );
  };
}

const liveSession = 'SELECT json, expired_at FROM sessions WHERE id = ? AND expired_at > ? AND destroyed_at IS NULL';

/**
 * Reads go through a prepared statement and the short-lived sign-in cache; writes and ends go
 * through the store as before, then clear the session from the cache on every instance.
 */
function cacheReads(store: TypeormStore, dataSource: DataSource, cache: SignInCache): void {
  const read = fastRead(dataSource);
  store.get = (sid, callback) => {
    const now = Date.now();
    const held = cache.sessions.get(sid);
    if (held && held.expiredAt > now) return callback(undefined, JSON.parse(held.json));
    const stamp = cache.sessions.stamp();
    read.one<{ json: string; expired_at: number | string }>(liveSession, [sid, now]).then((row) => {
      if (!row) return callback(undefined, null);
      cache.sessions.setRead(sid, { json: row.json, expiredAt: Number(row.expired_at) }, stamp);
      callback(undefined, JSON.parse(row.json));
    }, callback);
  };
  const set = store.set.bind(store);
  store.set = (sid, signInSession, callback) => {
    set(sid, signInSession, (error?: unknown) => {
      cache.sessionChanged(sid);
      callback?.(error);
    });
  };
  // The store's own destroy answers before its delete has run; this one answers after.
  store.destroy = (sid, callback) => {
    const sids = Array.isArray(sid) ? sid : [sid];
    Promise.all(sids.map((id) => dataSource.getRepository(SignInSessionEntity).softDelete({ id }))).then(() => {
      for (const id of sids) cache.sessionChanged(id);
      callback?.();
    }, callback);
  };
}

/** Sign-in sessions live in the database (connect-typeorm), so sign-ins survive a restart and work on any instance. */
export function signInSessionMiddleware(dataSource: DataSource, secret: string, behindHttpsProxy: boolean, cache: SignInCache): RequestHandler {
  const store = new TypeormStore({ cleanupLimit: 2, ttl: twelveHours / 1000 }).connect(dataSource.getRepository(SignInSessionEntity));
  throttleTouch(store, dataSource, cache);
  cacheReads(store, dataSource, cache);
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

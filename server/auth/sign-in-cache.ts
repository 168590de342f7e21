import type { UserEntity } from '../db/entities/user.entity';
import type { EventBus } from '../services/events';

/**
 * Every signed-in request needs its sign-in session and its user; reading both from the database
 * each time costs more than most reads themselves. This keeps them in memory for a few seconds.
 * Any change made through the app clears the entry on every instance at once (the change feed
 * carries `sign-in.changed` and `user.changed`, through PostgreSQL's NOTIFY between instances);
 * the time limit only bounds changes made behind the app's back (the CLI, SQL by hand).
 */
export const signInCacheMs = 10_000;
// A bound on memory, far above the sign-ins of a shop; past it the cache starts again.
const maxEntries = 20_000;

interface Held<T> {
  value: T;
  until: number;
}

class ShortLived<K, T> {
  private readonly entries = new Map<K, Held<T>>();
  /** Counts forgettings: a read that began before one must not put back what it found. */
  private forgotten = 0;

  constructor(private readonly ms: number) {}

  get(key: K): T | undefined {
    const held = this.entries.get(key);
    if (!held) return undefined;
    if (held.until > Date.now()) return held.value;
    this.entries.delete(key);
    return undefined;
  }

  /** Taken before reading from the database; hand it to `setRead`. */
  stamp(): number {
    return this.forgotten;
  }

  /** Keeps what a read found, unless something was forgotten while it ran (it may be that very entry). */
  setRead(key: K, value: T, stamp: number): void {
    if (stamp === this.forgotten) this.set(key, value);
  }

  set(key: K, value: T): void {
    if (this.entries.size >= maxEntries) this.entries.clear();
    this.entries.set(key, { value, until: Date.now() + this.ms });
  }

  delete(key: K): void {
    this.forgotten += 1;
    this.entries.delete(key);
  }
}

/** A stored sign-in session as the store read it: its JSON (parsed afresh for each request) and expiry. */
export interface HeldSession {
  json: string;
  expiredAt: number;
}

export class SignInCache {
  readonly sessions: ShortLived<string, HeldSession>;
  readonly users: ShortLived<number, UserEntity>;

  constructor(
    private readonly events: EventBus,
    ms = signInCacheMs,
  ) {
    this.sessions = new ShortLived(ms);
    this.users = new ShortLived(ms);
    events.subscribe((event) => {
      if (event.type === 'sign-in.changed') this.sessions.delete(event.sid);
      if (event.type === 'user.changed') this.users.delete(event.id);
    });
  }

  /** After a session was written or ended here: forget it on this instance and every other. */
  sessionChanged(sid: string): void {
    this.sessions.delete(sid);
    this.events.publish({ type: 'sign-in.changed', sid, siteId: null });
  }
}

const caches = new WeakMap<EventBus, SignInCache>();

/** One cache per change feed, so the session store and passport share it. */
export function signInCacheFor(events: EventBus): SignInCache {
  let cache = caches.get(events);
  if (!cache) caches.set(events, (cache = new SignInCache(events)));
  return cache;
}

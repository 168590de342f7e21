import type { Request, RequestHandler } from 'express';
import type { HeldSession, SignInCache } from '../auth/sign-in-cache';
import type { UserEntity } from '../db/entities/user.entity';
import type { ResponseCache } from '../lib/response-cache';
import { toSignedInUser } from '../services/users';
import { signInCookieName } from '../middleware/sign-in-session';
import { sendAnswer } from './cached-answers';

/**
 * What one signed-in caller's GET of one address was last answered from: the cache key the full
 * route worked out, and the very sign-in session and user (as the sign-in cache holds them) it was
 * worked out for.
 */
interface Shortcut {
  key: string;
  sid: string;
  session: HeldSession;
  userId: number;
  user: UserEntity;
}

// A bound on memory far above a shop's screens; past it the map starts again.
const maxShortcuts = 20_000;

/** The cookie's text exactly as sent, only when the header carries it once. */
function signInCookieOf(req: Request): string | undefined {
  const header = req.headers.cookie;
  if (!header) return undefined;
  const parts = header.split(';').filter((part) => part.trimStart().startsWith(`${signInCookieName}=`));
  return parts.length === 1 ? parts[0].trim().slice(signInCookieName.length + 1) : undefined;
}

/** The cookie's value as express-session reads it (percent-decoded), or null when it does not decode. */
function decoded(cookie: string): string | null {
  try {
    return decodeURIComponent(cookie);
  } catch {
    return null;
  }
}

/** The sign-in a held session names: `{ passport: { user: { id, epoch } } }`. */
function signInOf(session: HeldSession): { id: number; epoch: number } | undefined {
  const user = (JSON.parse(session.json) as { passport?: { user?: unknown } }).passport?.user;
  if (typeof user === 'number') return { id: user, epoch: 0 };
  if (user && typeof user === 'object' && 'id' in user && 'epoch' in user) return user as { id: number; epoch: number };
  return undefined;
}

/**
 * A repeat read answered before the sign-in session, passport, the CSRF check and the router run.
 *
 * A cached read costs little itself; reading the session cookie (two HMACs), parsing and hashing
 * the session, passport's user, the query schema and the router's walk cost several times more.
 * When a caller asks for an address again with the same cookie, and the sign-in cache still
 * holds the very same session and user objects the last full answer was worked out for, the
 * checks would come out the same: the same user in the same role and site, allowed the same
 * route, with the same cache key. Any change to the session (sign-out, renewal, touch) or to the
 * user (role, site, disabled, password reset) replaces or drops those objects on every instance,
 * and they last only seconds, so the next request goes the full way again. The cached answer
 * itself is looked up afresh each time: this skips only the checks, never the cache's own rules.
 */
export class AnswerShortcuts {
  private readonly byRequest = new Map<string, Shortcut>();

  constructor(
    private readonly signIns: SignInCache,
    private readonly answers: ResponseCache,
  ) {}

  /** After the full route answered 200 under `key`: remember it, when the sign-in cache holds exactly what the route checked. */
  remember(req: Request, key: string): void {
    const cookie = signInCookieOf(req);
    const sid = req.sessionID;
    const user = req.user;
    if (!cookie || !sid || !user || req.sensorBooth || req.headers.authorization) return;
    if (!decoded(cookie)?.startsWith(`s:${sid}.`)) return;
    const session = this.signIns.sessions.get(sid);
    const held = this.signIns.users.get(user.id);
    if (!session || !held || !this.stillTheSame(session, held, user)) return;
    if (this.byRequest.size >= maxShortcuts) this.byRequest.clear();
    this.byRequest.set(`${cookie}\n${req.originalUrl}`, { key, sid, session, userId: user.id, user: held });
  }

  /** The held session and user pass the checks the full way made (passport's own), for the user it answered. */
  private stillTheSame(session: HeldSession, held: UserEntity, user: Express.User): boolean {
    const signIn = signInOf(session);
    if (!signIn || signIn.id !== held.id || signIn.epoch !== held.sessionEpoch || held.disabled) return false;
    if (session.expiredAt <= Date.now()) return false;
    return JSON.stringify(toSignedInUser(held)) === JSON.stringify(user);
  }

  /** Mounted before the sign-in session: answers a repeat read it can, passes everything else on. */
  readonly lane: RequestHandler = (req, res, next) => {
    if (req.method !== 'GET' || req.headers.authorization) return next();
    const cookie = signInCookieOf(req);
    const shortcut = cookie === undefined ? undefined : this.byRequest.get(`${cookie}\n${req.originalUrl}`);
    if (!shortcut) return next();
    const session = this.signIns.sessions.get(shortcut.sid);
    const valid = session === shortcut.session && session.expiredAt > Date.now() && this.signIns.users.get(shortcut.userId) === shortcut.user;
    const answer = valid ? this.answers.get(shortcut.key) : undefined;
    if (!answer) return next();
    sendAnswer(req, res, 200, answer).catch(next);
  };
}

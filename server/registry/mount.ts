import type { Request, RequestHandler, Router } from 'express';
import type passport from 'passport';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { can } from '../../shared/permissions';
import type { AppConfig } from '../config/env';
import { openSiteData } from '../data/site-data';
import { AppError } from '../lib/app-error';
import { oneSite, siteScopeFor } from '../lib/site-scope';
import { requirePermission, requireSignIn } from '../middleware/permissions';
import { signInLimits } from '../middleware/sign-in-limits';
import { singleUpload } from '../middleware/upload';
import { createServiceSet, type ServiceDeps } from '../services/service-set';
import type { CachedAnswer, ResponseCache } from '../lib/response-cache';
import type { AnswerShortcuts } from './answer-shortcuts';
import { answerKey, clearedByOf, keepUntil, sendAnswer, staleSiteOf, toCachedAnswer } from './cached-answers';
import { answered, Reply, type Access, type ApiRoute, type RouteContext } from './route';

export interface RegistryDeps {
  dataSource: DataSource;
  config: AppConfig;
  services: ServiceDeps;
  auth: passport.PassportStatic;
  /** GET answers of the routes that declare `cache`; cleared through the change feed. */
  answers: ResponseCache;
  /** Repeat reads answered before the sign-in session; told of each cached answer sent. */
  shortcuts: AnswerShortcuts;
}

const pass: RequestHandler = (_req, _res, next) => next();

/** A booth sensor's bearer token (checked by sensorAuth) stands in for the permission. */
const sensorOr =
  (check: RequestHandler): RequestHandler =>
  (req, res, next) =>
    req.sensorBooth ? next() : check(req, res, next);

export function accessCheck(access: Access): RequestHandler {
  if (access === 'public') return pass;
  if (access === 'signed-in') return requireSignIn;
  if (typeof access === 'object') return sensorOr(requirePermission(access.sensorOr));
  return requirePermission(access);
}

/** Query keys a route does not name are refused, each with its own field message, rather than ignored. */
export function parseQuery(schema: z.ZodObject | undefined, raw: Request['query']): Record<string, unknown> | undefined {
  const allowed = new Set(Object.keys(schema?.shape ?? {}));
  const unknown = Object.keys(raw).filter((key) => !allowed.has(key));
  if (unknown.length) {
    const fields = Object.fromEntries(unknown.map((key) => [key, allowed.size ? `Not a parameter of this address; it takes ${[...allowed].join(', ')}` : 'This address takes no parameters']));
    throw new AppError('validation_failed', 'The address has a query parameter this route does not take', fields);
  }
  return schema?.parse(raw);
}

/** Literal path segments before parameters, so `/jobs/parts-template.csv` is never read as `/jobs/:id`. */
export function mountOrder(routes: ApiRoute[]): ApiRoute[] {
  const shape = (route: ApiRoute) => route.path.split('/').map((segment) => (segment.startsWith(':') ? 1 : 0));
  const compare = (a: number[], b: number[]) => {
    for (let i = 0; i < Math.min(a.length, b.length); i++) if (a[i] !== b[i]) return a[i] - b[i];
    return 0;
  };
  return [...routes].sort((a, b) => compare(shape(a), shape(b)));
}

function contextOf(req: Request, query: Record<string, unknown> | undefined, deps: RegistryDeps): Omit<RouteContext, 'res'> {
  const user = req.user ?? null;
  const sensor = req.sensorBooth ?? null;
  const scope = sensor ? oneSite(sensor.siteId) : siteScopeFor(user, query?.siteId as number | undefined);
  const actor = user ? { id: user.id, name: user.name } : { id: null, name: 'anonymous' };
  return {
    services: createServiceSet(openSiteData(deps.dataSource, scope), deps.services),
    scope,
    user,
    actor,
    runner: { ...actor, ownSpraySessionsOnly: !can(user?.role, 'spray-sessions:write') },
    sensor,
    req,
    auth: deps.auth,
    config: deps.config,
  };
}

/** The answer's status and body, or `answered` when the handler wrote the response itself. */
async function run(route: ApiRoute, req: Request, ctx: RouteContext, input: Omit<Parameters<ApiRoute['handler']>[0], 'file'>, deps: RegistryDeps) {
  try {
    const result = await route.handler({ ...input, file: req.file }, ctx);
    if (result === answered) return answered;
    return result instanceof Reply ? { status: result.status, answer: result.body } : { status: route.response.status, answer: result };
  } finally {
    // Any signed-in write (or attempt: a failed one may have written part-way) makes cached answers out of date, here and on every other instance.
    if (route.method !== 'get' && route.access !== 'public') deps.services.events.publish({ type: 'answers.stale', siteId: staleSiteOf(route.sites, ctx.scope) });
  }
}

/** In tests, every answer must be what the route's response schema (and so the API document) says. */
function assertMatchesSchema(route: ApiRoute, answer: unknown): void {
  const checked = route.response.schema?.safeParse(answer);
  if (checked && !checked.success) throw new Error(`${route.method.toUpperCase()} ${route.path} answered a body its response schema refuses: ${z.prettifyError(checked.error)}`);
}

/** The last step of every route: parse, answer from the cache when it may, else hand the scope's services to the handler and send its answer. */
function handle(route: ApiRoute, deps: RegistryDeps): RequestHandler {
  const checkAnswers = deps.config.env === 'test';
  const policy = route.method === 'get' ? route.cache : undefined;
  const nowMs = () => deps.services.clock.now().getTime();
  return async (req, res) => {
    const params = route.params?.parse(req.params);
    const query = parseQuery(route.query, req.query);
    const body = route.body?.parse(req.body ?? {});
    // Sign-in reads the parsed body (trimmed, lower-cased e-mail), never the raw one.
    if (route.body) req.body = body;
    const form = route.multipart?.fields.parse(req.body ?? {});
    const ctx: RouteContext = { ...contextOf(req, query, deps), res };
    const key = policy ? answerKey(policy, req, ctx) : '';
    const held = policy ? (deps.answers.get(key) ?? (await deps.answers.underWayFor(key))) : undefined;
    if (held) {
      deps.shortcuts.remember(req, key);
      return sendAnswer(req, res, 200, held);
    }
    const stamp = deps.answers.stamp();
    let share: (answer: CachedAnswer | undefined) => void = () => {};
    if (policy) deps.answers.workingOn(key, stamp, new Promise((resolve) => (share = resolve)));
    try {
      const result = await run(route, req, ctx, { params, query, body, form }, deps);
      if (result === answered) return;
      const { status, answer } = result;
      if (status === 204) return void res.status(204).end();
      if (checkAnswers) assertMatchesSchema(route, answer);
      if (!policy) return void res.status(status).json(answer);
      const cached = toCachedAnswer(answer);
      if (status === 200) {
        deps.answers.set(key, cached, clearedByOf(policy, ctx.scope), keepUntil(policy, answer, nowMs()), stamp);
        deps.shortcuts.remember(req, key);
        share(cached);
      }
      await sendAnswer(req, res, status, cached);
    } finally {
      // Whoever waited on an answer that never came works it out themselves.
      share(undefined);
    }
  };
}

/** Mounts each route with, in order: its sign-in limits (per address and per account), its access check, its upload, then the handler. */
export function mountRoutes(router: Router, routes: ApiRoute[], deps: RegistryDeps): void {
  const signInLimit = signInLimits(deps.config.loginRateLimit, deps.config.loginAccountRateLimit);
  for (const route of mountOrder(routes)) {
    const chain: RequestHandler[] = [];
    if (route.limit === 'sign-in') chain.push(...signInLimit);
    chain.push(accessCheck(route.access));
    if (route.multipart) chain.push(singleUpload(route.multipart.file.maxBytes));
    chain.push(handle(route, deps));
    router[route.method](route.path.replace(/^\/api(?=\/)/, ''), ...chain);
  }
}

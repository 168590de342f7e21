import type { Request, Response } from 'express';
import type passport from 'passport';
import type { z } from 'zod';
import type { Permission } from '../../shared/permissions';
import type { SignedInUser } from '../../shared/schemas/auth';
import type { AppConfig } from '../config/env';
import type { SiteScope } from '../lib/site-scope';
import type { Actor } from '../services/audit';
import type { Upload } from '../services/files';
import type { SensorBooth } from '../services/readings';
import type { ServiceSet } from '../services/service-set';
import type { SpraySessionRunner } from '../services/spray-session-runner';

export type HttpMethod = 'get' | 'post' | 'patch' | 'delete';

/**
 * Who may call a route: anyone (`public`), any signed-in user (`signed-in`), a role holding the
 * permission, or (for readings) a booth sensor's bearer token standing in for that permission.
 */
export type Access = Permission | 'public' | 'signed-in' | { sensorOr: Permission };

/**
 * How a route meets the site boundary, for the docs and the site matrix test:
 * `site`: it reads or writes one site's things, and another site's ids answer 403/404 (or a list without them);
 * `group`: what it shows is the whole group's (jobs, data sheets, settings, site names), the same for every site;
 * `own`: only the caller's own things (their sign-in, their notifications), or nothing at all.
 */
export type SiteReach = 'site' | 'group' | 'own';

export interface FileField {
  /** Largest file taken, bytes. */
  maxBytes: number;
  /** What the file is, for the API document. */
  description: string;
}

export interface ResponseSpec {
  /** The success status; `otherStatuses` lists any other success answer (a replay, a preview). */
  status: number;
  otherStatuses?: number[];
  /** The JSON body; checked against every answer in tests. */
  schema?: z.ZodType;
  /** A body that is not JSON: a CSV or PDF download, a photo, or an event stream. */
  contentType?: 'text/csv' | 'application/pdf' | 'image/jpeg' | 'text/event-stream';
  description?: string;
}

/**
 * A GET route whose JSON answers the response cache keeps, per site scope, role and address (and
 * user with `perUser`), each with a strong ETag. Any write through the API clears them (see mount.ts).
 */
export interface CachePolicy {
  /**
   * `site`: the answer reads only the scope's own sites, so only a change there (or a group-wide
   * one) clears it; `any`: it reads across sites (parts move between sites, jobs are the group's),
   * so a change on any site clears it.
   */
  clearedBy: 'site' | 'any';
  /** The answer differs from user to user, not only by role and site. */
  perUser?: boolean;
  /**
   * The answer depends on the clock (states that change as time passes): kept only until the
   * earliest instant in it still to come, and never longer than `clockBoundMs` (mount.ts).
   */
  clock?: boolean;
}

type Parsed<S> = S extends z.ZodType ? z.output<S> : undefined;

/** What a handler is given: the parsed request, and who is asking with their services. */
export interface RouteInput<P, Q, B, M> {
  params: Parsed<P>;
  query: Parsed<Q>;
  body: Parsed<B>;
  form: Parsed<M>;
  file: Upload | undefined;
}

export interface RouteContext {
  /** Every service, bound to this request's site scope. */
  services: ServiceSet;
  scope: SiteScope;
  user: SignedInUser | null;
  actor: Actor;
  /** The actor for coat, pot and correction writes: anyone who may not book sessions runs only their own. */
  runner: SpraySessionRunner;
  /** Set when a booth sensor posts with its bearer token instead of a sign-in. */
  sensor: SensorBooth | null;
  /** For the few routes that sign in, stream or download; everything else returns its body. */
  req: Request;
  res: Response;
  auth: passport.PassportStatic;
  config: AppConfig;
}

/** Returned by a handler that has written the response itself (a download, a stream, sign-out). */
export const answered = Symbol('answered');

/** A body with a status other than the route's usual one (a replayed coat, a previewed import). */
export class Reply {
  constructor(
    readonly status: number,
    readonly body: unknown,
  ) {}
}

export type HandlerResult = unknown | Reply | typeof answered;

export interface RouteSpec<P, Q, B, M> {
  method: HttpMethod;
  /** The full Express path: `/api/coats/:id/corrections`. */
  path: string;
  summary: string;
  access: Access;
  sites: SiteReach;
  params?: P;
  /** Every query parameter the route takes; any other key is refused with 400. */
  query?: Q;
  body?: B;
  /** A multipart form: its text fields and one file in the field `file`. */
  multipart?: { fields: Exclude<M, undefined>; file: FileField };
  response: ResponseSpec;
  /** Failed sign-ins are limited per address and per account (the e-mail typed). */
  limit?: 'sign-in';
  /** Kept in the response cache; only on GET routes answering JSON. */
  cache?: CachePolicy;
  /** Answered before the sign-in session is read (health, the API document). */
  bare?: boolean;
  handler(input: RouteInput<P, Q, B, M>, ctx: RouteContext): HandlerResult | Promise<HandlerResult>;
}

/** A route as the registry keeps it, its schemas' types forgotten. */
export type ApiRoute = RouteSpec<z.ZodObject | undefined, z.ZodObject | undefined, z.ZodType | undefined, z.ZodObject | undefined>;

/** Declares one route; the types of `handler`'s input follow from the schemas given. */
export function defineRoute<
  P extends z.ZodObject | undefined = undefined,
  Q extends z.ZodObject | undefined = undefined,
  B extends z.ZodType | undefined = undefined,
  M extends z.ZodObject | undefined = undefined,
>(spec: RouteSpec<P, Q, B, M>): ApiRoute {
  return spec as unknown as ApiRoute;
}

import type { Request } from 'express';
import { seesAllSites } from '../../shared/permissions';
import { siteFilterSchema } from '../../shared/schemas/site';
import { AppError } from './app-error';

/** Which sites one request may see and change. */
export interface SiteScope {
  /** The site lists are limited to; null when an admin looks across every site. */
  siteId: number | null;
  /** Where something new goes when no site is named: the user's own site. */
  homeSiteId: number;
  /** An admin may work on any site; everyone else on their own only. */
  allSites: boolean;
}

/** Every site: for the system itself (seed, scheduler, tests that act as no one). */
export const everySite: SiteScope = { siteId: null, homeSiteId: 1, allSites: true };

/** From the signed-in user, and for an admin an optional `?siteId=` to look at one site. */
export function siteScopeOf(req: Request): SiteScope {
  const user = req.user;
  if (!user) return everySite;
  if (seesAllSites(user.role)) {
    const { siteId } = siteFilterSchema.parse(req.query);
    return { siteId: siteId ?? null, homeSiteId: user.siteId, allSites: true };
  }
  return { siteId: user.siteId, homeSiteId: user.siteId, allSites: false };
}

export function inScope(scope: SiteScope, siteId: number): boolean {
  return scope.allSites ? scope.siteId === null || scope.siteId === siteId : siteId === scope.homeSiteId;
}

/** The site a new or moved thing goes to; only an admin may name another site than their own. */
export function siteForWrite(scope: SiteScope, requested: number | undefined): number {
  const siteId = requested ?? scope.homeSiteId;
  if (!scope.allSites && siteId !== scope.homeSiteId) throw new AppError('forbidden', 'Only an admin can put things on another site', { siteId: 'Your own site only' });
  return siteId;
}

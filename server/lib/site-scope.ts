import { seesAllSites } from '../../shared/permissions';
import type { SignedInUser } from '../../shared/schemas/auth';
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

/** One site only: a booth's sensor, or anyone who is not an admin. */
export const oneSite = (siteId: number): SiteScope => ({ siteId, homeSiteId: siteId, allSites: false });

/**
 * From the signed-in user: an admin sees every site, or the one named by `?siteId=` on a route
 * that takes it; everyone else is held to their own site whatever they ask for.
 */
export function siteScopeFor(user: Pick<SignedInUser, 'role' | 'siteId'> | null | undefined, requestedSiteId?: number): SiteScope {
  if (!user) return everySite;
  if (seesAllSites(user.role)) return { siteId: requestedSiteId ?? null, homeSiteId: user.siteId, allSites: true };
  return oneSite(user.siteId);
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

import { seesAllSites, type Role } from '../../../../shared/permissions';
import type { Site } from '../../../../shared/schemas/site';

interface SiteOption {
  value: number;
  label: string;
}

/** What the client shows about sites to someone who works across several of them. */
export interface SiteView {
  sites: readonly Site[];
  /** Site names by id, for a Site column. */
  names: ReadonlyMap<number, string>;
  /** The Site select on booth, rack and user forms. */
  choice: { options: SiteOption[]; defaultSiteId: number };
}

export interface SiteViewer {
  role: Role;
  siteId: number;
}

/**
 * Null when sites are nothing to this viewer: a one-site shop, or anyone but an admin (the server
 * keeps their lists and new things on their own site). Otherwise the names and the form's choice,
 * defaulting to the site being looked at, else the viewer's own.
 */
export function siteViewFor(viewer: SiteViewer, sites: readonly Site[] | undefined, lookingAt?: number): SiteView | null {
  if (!seesAllSites(viewer.role) || !sites || sites.length < 2) return null;
  const known = (id: number | undefined) => id !== undefined && sites.some((site) => site.id === id);
  const defaultSiteId = known(lookingAt) ? lookingAt! : known(viewer.siteId) ? viewer.siteId : sites[0].id;
  return {
    sites,
    names: new Map(sites.map((site) => [site.id, site.name])),
    choice: { options: sites.map((site) => ({ value: site.id, label: site.name })), defaultSiteId },
  };
}

/** A `?site=` value worth sending: a known site, and only for a viewer who may pick one. */
export function siteFilterFrom(raw: string | null, view: SiteView | null): number | undefined {
  if (!view || !raw) return undefined;
  const id = Number(raw);
  return view.sites.some((site) => site.id === id) ? id : undefined;
}

import type { EntityManager } from 'typeorm';

/**
 * How the rows of one table belong to a site. Booths, racks and users carry a site; spray
 * sessions belong to their booth's site; mixes, coats, denibs and planned items to their session's;
 * readings to their booth's or rack's; audit entries to the site they were written about (or to
 * the whole group). Jobs, parts, products, finish systems and settings are group-wide, but a part
 * placed on a rack is placed on that rack's site.
 */
export interface SiteRule<E> {
  /** SQL, on the row alias, true for rows of the site bound as `:scopeSiteId`; absent when every site shares the rows. */
  where?: (alias: string) => string;
  /** The sites a row about to be written touches; none for a group-wide row. */
  sitesOf(row: Partial<E>, manager: EntityManager): Promise<number[]>;
  /** Rows the whole group shares: nothing to check on read or write. */
  shared?: true;
}

const boothsOfSite = 'SELECT sb.id FROM booths sb WHERE sb.site_id = :scopeSiteId';
const racksOfSite = 'SELECT sr.id FROM racks sr WHERE sr.site_id = :scopeSiteId';

// Rows reached through a spray session are checked row by row (a correlated EXISTS on primary keys)
// rather than against the list of the site's sessions or coats: with a million coats, SQLite would
// otherwise build that whole list, or walk it, for a query about one coat. The inner aliases are
// unlike any outer alias, since `a` is used inside the subquery.
const sessionOnSite = (sessionId: string) =>
  `EXISTS (SELECT 1 FROM spray_sessions scope_ss JOIN booths scope_sb ON scope_sb.id = scope_ss.booth_id WHERE scope_ss.id = ${sessionId} AND scope_sb.site_id = :scopeSiteId)`;
const throughSession = (table: string, id: string) =>
  `EXISTS (SELECT 1 FROM ${table} scope_row JOIN spray_sessions scope_ss ON scope_ss.id = scope_row.spray_session_id JOIN booths scope_sb ON scope_sb.id = scope_ss.booth_id WHERE scope_row.id = ${id} AND scope_sb.site_id = :scopeSiteId)`;

/** The site of the row with this id, by one of the lookups below; none when there is no such row. */
async function siteOf(manager: EntityManager, lookup: (id: string) => string, id: number | null | undefined): Promise<number[]> {
  if (id === null || id === undefined) return [];
  const placeholder = manager.connection.options.type === 'postgres' ? '$1' : '?';
  const rows: { site_id: unknown }[] = await manager.query(lookup(placeholder), [id]);
  return rows.length ? [Number(rows[0].site_id)] : [];
}

const boothSites = (id: string) => `SELECT site_id FROM booths WHERE id = ${id}`;
const rackSites = (id: string) => `SELECT site_id FROM racks WHERE id = ${id}`;
const spraySessionSites = (id: string) => `SELECT b.site_id FROM spray_sessions s JOIN booths b ON b.id = s.booth_id WHERE s.id = ${id}`;
const coatSites = (id: string) => `SELECT b.site_id FROM coats c JOIN spray_sessions s ON s.id = c.spray_session_id JOIN booths b ON b.id = s.booth_id WHERE c.id = ${id}`;
const denibSites = (id: string) => `SELECT b.site_id FROM denibs d JOIN spray_sessions s ON s.id = d.spray_session_id JOIN booths b ON b.id = s.booth_id WHERE d.id = ${id}`;

const own = (siteId: number | undefined): number[] => (siteId === undefined ? [] : [siteId]);

export const groupWide: SiteRule<object> = { shared: true, sitesOf: async () => [] };

export const ownSite: SiteRule<{ siteId: number }> = {
  where: (a) => `${a}.site_id = :scopeSiteId`,
  sitesOf: async (row) => own(row.siteId),
};

export const byBooth: SiteRule<{ boothId: number }> = {
  where: (a) => `${a}.booth_id IN (${boothsOfSite})`,
  sitesOf: (row, manager) => siteOf(manager, boothSites, row.boothId),
};

export const bySpraySession: SiteRule<{ spraySessionId: number }> = {
  where: (a) => sessionOnSite(`${a}.spray_session_id`),
  sitesOf: (row, manager) => siteOf(manager, spraySessionSites, row.spraySessionId),
};

export const byCoat: SiteRule<{ coatId: number }> = {
  where: (a) => throughSession('coats', `${a}.coat_id`),
  sitesOf: (row, manager) => siteOf(manager, coatSites, row.coatId),
};

export const byDenib: SiteRule<{ denibId: number }> = {
  where: (a) => throughSession('denibs', `${a}.denib_id`),
  sitesOf: (row, manager) => siteOf(manager, denibSites, row.denibId),
};

export const byBoothOrRack: SiteRule<{ boothId: number | null; rackId: number | null }> = {
  where: (a) => `(${a}.booth_id IN (${boothsOfSite}) OR ${a}.rack_id IN (${racksOfSite}))`,
  sitesOf: async (row, manager) => [...(await siteOf(manager, boothSites, row.boothId)), ...(await siteOf(manager, rackSites, row.rackId))],
};

/** Group-wide rows whose placement on a rack belongs to the rack's site. */
export const placedOnRack: SiteRule<{ rackId: number | null }> = {
  sitesOf: (row, manager) => siteOf(manager, rackSites, row.rackId),
};

/** Entries about one site's things, or (site null) about the group's. */
export const siteOrGroup: SiteRule<{ siteId: number | null }> = {
  where: (a) => `(${a}.site_id IS NULL OR ${a}.site_id = :scopeSiteId)`,
  sitesOf: async (row) => (row.siteId === null || row.siteId === undefined ? [] : [row.siteId]),
};

const usersOfSite = 'SELECT su.id FROM users su WHERE su.site_id = :scopeSiteId';
const userSites = (id: string) => `SELECT site_id FROM users WHERE id = ${id}`;

/** A person's own records (fit tests, health surveillance, training) belong to their site. */
export const byUser: SiteRule<{ userId: number }> = {
  where: (a) => `${a}.user_id IN (${usersOfSite})`,
  sitesOf: (row, manager) => siteOf(manager, userSites, row.userId),
};

import type { Dialect } from '../../data/site-data';

/**
 * Collects parameters for one raw statement and writes the placeholders each driver expects
 * (`?` for better-sqlite3, `$n` for pg), plus the few expressions the two dialects spell apart.
 */
export class Statement {
  readonly params: unknown[] = [];

  constructor(readonly dialect: Dialect) {}

  param(value: unknown): string {
    this.params.push(value);
    return this.dialect === 'postgres' ? `$${this.params.length}` : '?';
  }

  /** Hours between two ISO instants stored as text. */
  hoursBetween(from: string, to: string): string {
    return this.dialect === 'postgres'
      ? `(EXTRACT(EPOCH FROM (CAST(${to} AS timestamptz) - CAST(${from} AS timestamptz))) / 3600.0)`
      : `((julianday(${to}) - julianday(${from})) * 24.0)`;
  }

  /** A table of time buckets as a VALUES list, for a CTE `b(label, starts_at, ends_at)`. */
  bucketValues(buckets: readonly { label: string; startsAt: string; endsAt: string }[]): string {
    const rows = buckets.map((b) => `(${this.param(b.label)}, ${this.param(b.startsAt)}, ${this.param(b.endsAt)})`);
    // PostgreSQL types bare parameters in VALUES as text; say so once so comparisons are text to text.
    if (this.dialect === 'postgres' && rows.length > 0) rows[0] = rows[0].replace(/\$(\d+)/g, 'CAST($$$1 AS varchar)');
    return `b(label, starts_at, ends_at) AS (VALUES ${rows.join(', ')})`;
  }
}

/** Rows whose spray session ran in a booth of the site; nothing when the report covers every site. */
export function inSite(sql: Statement, spraySessionIdColumn: string, siteId: number | undefined): string {
  if (siteId === undefined) return '';
  return `AND ${spraySessionIdColumn} IN (SELECT st.id FROM spray_sessions st JOIN booths bs ON bs.id = st.booth_id WHERE bs.site_id = ${sql.param(siteId)})`;
}

/** Rows of a booth of the site, for rows that carry their booth: the site's few booths, not all its sessions. */
export function inSiteBooths(sql: Statement, boothIdColumn: string, siteId: number | undefined): string {
  if (siteId === undefined) return '';
  return `AND ${boothIdColumn} IN (SELECT bs.id FROM booths bs WHERE bs.site_id = ${sql.param(siteId)})`;
}

/** A coat version that no correction has replaced. */
export function isCurrentCoat(alias: string): string {
  return `NOT EXISTS (SELECT 1 FROM coats n WHERE n.replaces_id = ${alias}.id)`;
}

/** Numbers come back from pg as strings (numeric, bigint); from SQLite as numbers or null. */
export function num(value: unknown): number {
  const n = Number(value ?? 0);
  return Number.isFinite(n) ? n : 0;
}

export function round(value: number, places = 2): number {
  const f = 10 ** places;
  return Math.round(value * f) / f;
}

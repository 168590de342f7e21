import { describe, expect, it } from 'vitest';
import type { Site } from '../../../../shared/schemas/site';
import { siteFilterFrom, siteViewFor } from '../../../../src/features/sites/utils/site-view';

const site = (id: number, name: string): Site => ({ id, name, createdAt: '2026-01-01T00:00:00.000Z', updatedAt: '2026-01-01T00:00:00.000Z' });
const main = site(1, 'Main site');
const riverside = site(2, 'Riverside works');
const admin = { role: 'admin', siteId: 1 } as const;

describe('siteViewFor', () => {
  it('shows nothing about sites in a one-site shop, even to the admin', () => {
    expect(siteViewFor(admin, [main])).toBeNull();
  });

  it('shows nothing while the sites are still loading', () => {
    expect(siteViewFor(admin, undefined)).toBeNull();
  });

  it('shows nothing to a lead, sprayer or assembler of a shop with several sites: the server keeps them on their own', () => {
    for (const role of ['lead', 'sprayer', 'assembler'] as const) expect(siteViewFor({ role, siteId: 2 }, [main, riverside])).toBeNull();
  });

  it('gives an admin of several sites every site to choose, defaulting to their own', () => {
    const view = siteViewFor({ role: 'admin', siteId: 2 }, [main, riverside]);
    expect(view?.choice).toEqual({
      options: [
        { value: 1, label: 'Main site' },
        { value: 2, label: 'Riverside works' },
      ],
      defaultSiteId: 2,
    });
    expect(view?.names.get(2)).toBe('Riverside works');
  });

  it('defaults new things to the site the admin is looking at', () => {
    expect(siteViewFor(admin, [main, riverside], 2)?.choice.defaultSiteId).toBe(2);
  });

  it('falls back to the first site when the admin’s own is not in the list', () => {
    expect(siteViewFor({ role: 'admin', siteId: 9 }, [main, riverside], 7)?.choice.defaultSiteId).toBe(1);
  });
});

describe('siteFilterFrom', () => {
  const view = siteViewFor(admin, [main, riverside]);

  it('takes a known site from the address', () => {
    expect(siteFilterFrom('2', view)).toBe(2);
  });

  it('ignores an unknown or missing site, and any site for someone who cannot pick one', () => {
    expect(siteFilterFrom('99', view)).toBeUndefined();
    expect(siteFilterFrom('abc', view)).toBeUndefined();
    expect(siteFilterFrom(null, view)).toBeUndefined();
    expect(siteFilterFrom('2', null)).toBeUndefined();
  });
});

import AxeBuilder from '@axe-core/playwright';
import type { Page } from '@playwright/test';
import type { RouteObject } from 'react-router-dom';
import type { List } from '../../shared/schemas/common';
import type { Job } from '../../shared/schemas/job';
import type { Part } from '../../shared/schemas/part';
import type { SpraySession } from '../../shared/schemas/spray-session';
import { expect } from './fixtures';
import type { LeadApi } from './lead-api';

/** Every page pattern the router knows, written as full paths (`/jobs/:id`, `/settings` for an index, `/*`). */
export function routePatterns(routes: RouteObject[], parent = ''): string[] {
  return routes.flatMap((route) => {
    const own = route.path === undefined ? parent : route.path.startsWith('/') ? route.path : `${parent.replace(/\/$/, '')}/${route.path}`;
    const here = route.index || (route.path !== undefined && !route.children) ? [own || '/'] : [];
    return [...here, ...(route.children ? routePatterns(route.children, own) : [])];
  });
}

/** The demo shop's records the pages with an id show: found through the API, never hard-coded. */
export interface DemoIds {
  job: number;
  part: number;
  product: number;
  crewUser: number;
  /** A session booked now for the demo sprayer, so the booth screen shows its checklist and forms (0 when not asked for). */
  session: number;
}

/** The ids; `bookSession` books the sprayer's session now, which the test cancels again with `cancelSession`. */
export async function demoIds(api: LeadApi, bookSession = false): Promise<DemoIds> {
  const job = (await api.get<List<Job>>('/api/jobs?q=LJ-26-105')).items[0];
  const parts = await api.get<{ items: Part[] }>(`/api/jobs/${job.id}/parts`);
  const product = (await api.get<List<{ id: number }>>('/api/products')).items[0];
  const crew = await api.get<{ items: { userId: number; role: string }[] }>('/api/crew');
  return { job: job.id, part: parts.items[0].id, product: product.id, crewUser: crew.items.find((c) => c.role === 'sprayer')!.userId, session: bookSession ? await bookSprayerNow(api, parts.items[0].id) : 0 };
}

/** Leaves Booth 1 and the demo sprayer free again for the tests that book them now. */
export async function cancelSession(api: LeadApi, id: number) {
  if (id) await api.send('PATCH', `/api/spray-sessions/${id}`, { state: 'cancelled' });
}

/** A session on booth 1 for Mina (the demo sprayer) running now; clears anything booked for either around now. */
async function bookSprayerNow(api: LeadApi, partId: number): Promise<number> {
  const now = Date.now();
  const around = `from=${encodeURIComponent(new Date(now - 3 * 3_600_000).toISOString())}&to=${encodeURIComponent(new Date(now + 3 * 3_600_000).toISOString())}`;
  const { items } = await api.get<List<SpraySession>>(`/api/spray-sessions?${around}`);
  for (const old of items) if (old.state !== 'cancelled' && (old.sprayerId === 3 || old.boothId === 1)) await api.send('PATCH', `/api/spray-sessions/${old.id}`, { state: 'cancelled' });
  const { spraySession } = await api.send<{ spraySession: SpraySession }>('POST', '/api/spray-sessions', {
    boothId: 1,
    start: new Date(now - 5 * 60_000).toISOString(),
    end: new Date(now + 2 * 3_600_000).toISOString(),
    sprayerId: 3,
    items: [{ partId, stepPosition: 0 }],
    override: { reason: 'Accessibility walk: booked whatever the hour' },
  });
  return spraySession.id;
}

/** Waits for the page's own data: its first heading, and no "Loading …" or sign-in check left on screen. */
export async function settle(page: Page) {
  await expect(page.getByRole('heading', { level: 1 }).first()).toBeVisible();
  await expect(page.getByText(/^(Loading\b.*…|Checking your sign-in…)$/)).toHaveCount(0);
  await expect(page.getByRole('status').filter({ hasText: 'Loading page…' })).toHaveCount(0);
}

/**
 * The axe findings that matter on what the page shows now, one line per rule and element: serious and
 * critical ones, and moderate ones too (heading order, content outside landmarks), which a screen
 * reader user meets on every visit. Only "minor" findings are let through.
 */
export async function seriousFindings(page: Page, label: string): Promise<string[]> {
  const { violations } = await new AxeBuilder({ page }).analyze();
  return violations
    .filter((v) => v.impact !== 'minor')
    .flatMap((v) => v.nodes.map((node) => `${label}: ${v.id} (${v.impact}) at ${node.target.join(' ')}: ${node.failureSummary?.split('\n').slice(1, 2).join('').trim()}`));
}

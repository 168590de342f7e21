import AxeBuilder from '@axe-core/playwright';
import type { Page } from '@playwright/test';
import type { RouteObject } from 'react-router-dom';
import type { List } from '../../shared/schemas/common';
import type { Job } from '../../shared/schemas/job';
import type { Part } from '../../shared/schemas/part';
import { expect } from './fixtures';
import { bookSprayerNow, type LeadApi } from './lead-api';

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
  /** Gives the booked session's booth and sprayer back (nothing to do when none was booked). */
  cancel: () => Promise<void>;
}

/** The ids; `bookSession` books the sprayer's session now, which the test gives back with `cancel` in a `finally`. */
export async function demoIds(api: LeadApi, bookSession = false): Promise<DemoIds> {
  const job = (await api.get<List<Job>>('/api/jobs?q=LJ-26-105')).items[0];
  const parts = await api.get<{ items: Part[] }>(`/api/jobs/${job.id}/parts`);
  const product = (await api.get<List<{ id: number }>>('/api/products')).items[0];
  const crew = await api.get<{ items: { userId: number; role: string }[] }>('/api/crew');
  const booked = bookSession ? await bookSprayerNow(api, [{ partId: parts.items[0].id, stepPosition: 0 }], 'Accessibility walk: booked whatever the hour') : null;
  const ids = { job: job.id, part: parts.items[0].id, product: product.id, crewUser: crew.items.find((c) => c.role === 'sprayer')!.userId };
  return { ...ids, session: booked?.id ?? 0, cancel: booked?.cancel ?? (async () => {}) };
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

import type { Page } from '@playwright/test';
import { routes } from '../../src/app/router';
import { demoIds, routePatterns, seriousFindings, settle, type DemoIds } from './axe-walk';
import { box, fillPreSprayChecks } from './booth-steps';
import { expect, test } from './fixtures';
import { signIn, type DemoRole } from './helpers';
import { leadApi } from './lead-api';

/** Who opens a page, where, and anything done there first so axe also sees what that shows (a pop-up message). */
type Visit = { role: DemoRole | 'signed-out'; path: (ids: DemoIds) => string; then?: { label: string; act: (page: Page) => Promise<void>; undo?: (page: Page) => Promise<void> } };
const as = (role: Visit['role'], path: string | ((ids: DemoIds) => string), then?: Visit['then']): Visit => ({ role, path: typeof path === 'string' ? () => path : path, then });

/** Saves a units choice and waits for the pop-up message saying so. */
async function saveUnits(page: Page, units: RegExp) {
  await page.getByRole('radio', { name: units }).check();
  await page.getByRole('button', { name: 'Save preferences' }).click();
  // The newest message: the one from saving before may still be showing above it.
  await expect(page.getByText('Your preferences are saved.').last()).toBeVisible();
}
/** The booth screen once spraying, with a pot mixed: the mix card, the coat form and their messages. */
const spraying: Visit['then'] = {
  label: 'while spraying, with a mix recorded',
  act: async (page) => {
    await fillPreSprayChecks(page);
    await page.getByRole('button', { name: 'Start spraying' }).click();
    await page.getByRole('button', { name: 'Record a mix' }).click();
    await box(page, 'Amount to mix').fill('3');
    await page.getByRole('button', { name: 'Record mix' }).click();
    await expect(page.getByRole('article', { name: /^Mix: / })).toBeVisible();
  },
};
const savedMessage: Visit['then'] = { label: 'with the “saved” message', act: (page) => saveUnits(page, /^US/), undo: (page) => saveUnits(page, /^Metric/) };

/**
 * Every page of the router with the person who uses it. A page added to src/app/router.tsx
 * must be added here too: the first test fails until it is.
 */
const walk: Record<string, Visit[]> = {
  '/sign-in': [as('signed-out', '/sign-in')],
  '/': [as('lead', '/'), as('sprayer', '/'), as('assembler', '/')],
  '/booths': [as('admin', '/booths')],
  '/racks': [as('admin', '/racks')],
  '/planner': [as('lead', '/planner')],
  '/spray-sessions': [as('lead', '/spray-sessions'), as('sprayer', '/spray-sessions')],
  '/spray-sessions/:id': [as('sprayer', (ids) => `/spray-sessions/${ids.session}`, spraying)],
  '/coat-log': [as('lead', '/coat-log')],
  '/calculator': [as('sprayer', '/calculator')],
  '/activity': [as('admin', '/activity')],
  '/reports': [as('lead', '/reports')],
  '/data-sheets': [as('lead', '/data-sheets')],
  '/data-sheets/new': [as('lead', '/data-sheets/new')],
  '/data-sheets/:id': [as('lead', (ids) => `/data-sheets/${ids.product}`)],
  '/finish-systems': [as('lead', '/finish-systems')],
  '/jobs': [as('lead', '/jobs')],
  '/jobs/:id': [as('lead', (ids) => `/jobs/${ids.job}`)],
  '/jobs/:id/import': [as('lead', (ids) => `/jobs/${ids.job}/import`)],
  '/jobs/:id/tags': [as('lead', (ids) => `/jobs/${ids.job}/tags`)],
  '/parts/:id': [as('assembler', (ids) => `/parts/${ids.part}`)],
  '/ready': [as('assembler', '/ready')],
  '/upkeep': [as('lead', '/upkeep')],
  '/crew': [as('admin', '/crew')],
  '/crew/:userId': [as('admin', (ids) => `/crew/${ids.crewUser}`)],
  '/settings': [as('sprayer', '/settings')],
  '/settings/preferences': [as('sprayer', '/settings/preferences', savedMessage)],
  '/settings/shop': [as('admin', '/settings/shop')],
  '/settings/users': [as('admin', '/settings/users')],
  '/settings/sites': [as('admin', '/settings/sites')],
  '/settings/mailbox': [as('admin', '/settings/mailbox')],
  '/*': [as('lead', '/no-such-page')],
  '/ready/wall': [as('assembler', '/ready/wall')],
};

test('the walk covers every page in the router', () => {
  expect(Object.keys(walk).sort()).toEqual([...new Set(routePatterns(routes))].sort());
});

for (const role of ['signed-out', 'admin', 'lead', 'sprayer', 'assembler'] as const) {
  test(`no axe finding above minor on the pages ${role === 'signed-out' ? 'a signed-out visitor' : `the ${role}`} uses`, async ({ page, baseURL }) => {
    test.setTimeout(300_000);
    const api = await leadApi(baseURL!);
    const ids = await demoIds(api, role === 'sprayer');
    // A quiet console as well: no warning (React Router's missing HydrateFallback was one) and, before
    // sign-in, no request the server refuses.
    const findings: string[] = [];
    page.on('console', (message) => {
      // The browser tests block the service worker on purpose (playwright.config.ts), and the browser says so.
      if (message.type() === 'warning' && !message.text().includes('Service Worker registration blocked')) findings.push(`console warning on ${page.url()}: ${message.text()}`);
    });
    page.on('response', (response) => {
      if (role === 'signed-out' && response.status() >= 400) findings.push(`${response.status()} from ${response.url()} before sign-in`);
    });
    if (role !== 'signed-out') await signIn(page, role);
    try {
      for (const visit of Object.values(walk).flat().filter((v) => v.role === role)) {
        const path = visit.path(ids);
        await page.goto(path);
        await settle(page);
        findings.push(...(await seriousFindings(page, path)));
        if (!visit.then) continue;
        await visit.then.act(page);
        findings.push(...(await seriousFindings(page, `${path} ${visit.then.label}`)));
        await visit.then.undo?.(page);
      }
    } finally {
      // Even when a step fails: a session left spraying would keep its sprayer busy for the tests after this one.
      await ids.cancel();
      await api.context.dispose();
    }
    expect(findings).toEqual([]);
  });
}

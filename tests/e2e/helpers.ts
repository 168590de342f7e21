import type { Page } from '@playwright/test';
import { expect } from './fixtures';

export const demoPassword = 'finish-demo-2026';

export const demo = {
  admin: { email: 'owner@larchmere.test', name: 'Ros Halloran', roleLabel: 'Owner / admin' },
  lead: { email: 'lead@larchmere.test', name: 'Dev Okafor', roleLabel: 'Finishing lead' },
  sprayer: { email: 'sprayer@larchmere.test', name: 'Mina Castell', roleLabel: 'Sprayer' },
  assembler: { email: 'assembler@larchmere.test', name: 'Tomasz Brill', roleLabel: 'Assembler' },
} as const;

export type DemoRole = keyof typeof demo;

/** Signs in through the form, starting from `path` (which sends a signed-out visitor to /sign-in). */
export async function signIn(page: Page, role: DemoRole, path = '/') {
  await page.goto(path);
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
  await page.getByLabel('E-mail').fill(demo[role].email);
  await page.getByLabel('Password', { exact: true }).fill(demoPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('navigation', { name: 'Main' }).or(page.getByRole('button', { name: 'Menu' }))).toBeVisible();
}

export function mainNav(page: Page) {
  return page.getByRole('navigation', { name: 'Main' });
}

/**
 * A shop-clock time as the screens write it: "14:05" today, with "tomorrow " or a day ("Sun 6
 * Dec ", "Sun 6 Dec, ") in front on another day, as happens to a time a few hours ahead when a
 * run starts late in the evening. For building a RegExp.
 */
export const shopTimePattern = String.raw`(?:tomorrow |\w{3} \d{1,2} \w{3},? )?\d\d:\d\d`;

import type { Page } from '@playwright/test';
import { expect, test } from './fixtures';
import { mainNav, signIn } from './helpers';

const shopZone = 'Europe/London';
const sprayRoom = 'Back spray room';

/** Today's date and the hour on the shop's clock. */
function shopNow(): { date: string; hour: number } {
  const parts = new Intl.DateTimeFormat('en-GB', { timeZone: shopZone, year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', hourCycle: 'h23' }).formatToParts(new Date());
  const part = (type: string) => parts.find((p) => p.type === type)!.value;
  return { date: `${part('year')}-${part('month')}-${part('day')}`, hour: Number(part('hour')) };
}

// A short session today, hours away from now and outside opening hours on any day of the week:
// the booking always asks for a reason, and it never meets sessions other tests book around now.
const { date: today, hour } = shopNow();
const slot = hour < 12 ? { from: '22:00', to: '22:20' } : { from: '05:00', to: '05:20' };
const hours = `${slot.from}–${slot.to}`;

test.describe.configure({ mode: 'serial' });

/** Frees the slot (a rerun on the same database may have booked it) so the booking below is the test's own. */
async function freeTheSlot(page: Page) {
  const from = new Date(Date.now() - 30 * 3_600_000).toISOString();
  const to = new Date(Date.now() + 30 * 3_600_000).toISOString();
  const listed = await page.request.get(`/api/spray-sessions?from=${from}&to=${to}`);
  const { items } = (await listed.json()) as { items: { id: number; boothName: string; state: string; start: string }[] };
  const csrf = ((await (await page.request.get('/api/auth/csrf')).json()) as { token: string }).token;
  const clock = (iso: string) => new Intl.DateTimeFormat('en-GB', { timeZone: shopZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(iso));
  for (const old of items.filter((s) => s.boothName === sprayRoom && s.state === 'planned' && clock(s.start) === slot.from)) {
    await page.request.patch(`/api/spray-sessions/${old.id}`, { data: { state: 'cancelled' }, headers: { 'x-csrf-token': csrf } });
  }
}

test('a lead sees the day per booth, gives an unassigned session to a sprayer, and sees what needs acting on', async ({ page }) => {
  await page.setViewportSize({ width: 1366, height: 900 });
  await signIn(page, 'lead', '/planner');
  await freeTheSlot(page);
  await page.getByRole('button', { name: 'Book a session' }).click();
  const dialog = page.getByRole('dialog', { name: 'Book a spray session' });
  await dialog.getByLabel('Booth').selectOption({ label: sprayRoom });
  await dialog.getByLabel('Starts').fill(`${today}T${slot.from}`);
  await dialog.getByLabel('Ends').fill(`${today}T${slot.to}`);
  await dialog.getByLabel('Job').selectOption({ label: 'LJ-26-103 · Penhallow Interiors' });
  await dialog.getByRole('button', { name: 'Choose all 18 parts' }).click();
  await dialog.getByRole('button', { name: 'Book session' }).click();
  await dialog.getByRole('button', { name: 'Book anyway' }).click();
  await dialog.getByLabel('Reason for booking anyway').fill('Early start agreed for the panelling');
  await dialog.getByRole('button', { name: 'Book anyway' }).click();
  await expect(dialog).toBeHidden();

  await mainNav(page).getByRole('link', { name: 'Today', exact: true }).click();
  await expect(page.getByRole('heading', { name: 'Today', level: 1 })).toBeVisible();
  const room = page.getByRole('region', { name: sprayRoom, exact: true });
  const todays = room.getByRole('list', { name: `${sprayRoom}, today` });
  const session = todays.getByRole('listitem').filter({ hasText: hours });
  await expect(session).toContainText('No sprayer yet');
  await expect(session).toContainText('LJ-26-103 · coat 1 of 2: Kestrel Sanding Sealer NC · Natural · 18 parts');
  await expect(page.getByRole('status').filter({ hasText: /sessions? without a sprayer/ })).toBeVisible();

  await session.getByLabel(`Sprayer for ${sprayRoom}, ${hours}`).selectOption({ label: 'Mina Castell' });
  await expect(page.getByText(/^Mina Castell sprays Back spray room, \w{3} \d{1,2} \w{3}, \d{2}:\d{2}\.$/)).toBeVisible();
  await expect(session).not.toContainText('No sprayer yet');
  await expect(session.getByLabel(`Sprayer for ${sprayRoom}, ${hours}`)).toHaveValue(/\d+/);

  // What needs the lead today: each part says what it found, or that there is nothing.
  for (const heading of ['Recoat windows closing today', 'Jobs at risk of missing their due date', 'Waiting on a denib', 'Booth sensors gone quiet']) {
    await expect(page.getByRole('heading', { name: new RegExp(`^${heading}`) })).toBeVisible();
  }
  // The demo shop's booth 1 has arrestor pads near their limit: the lead sees it and reaches the upkeep page from it.
  const upkeep = page.getByRole('region', { name: /^Upkeep and crew records due/ });
  await expect(upkeep).toContainText(/Filter bank .* Pa limit/);
  await page.screenshot({ path: '/tmp/shots/today-lead-1366.png', fullPage: true });
  await upkeep.getByRole('link', { name: 'Booth 1 (cross-draft)' }).click();
  await expect(page.getByRole('heading', { name: 'Booth upkeep', level: 1 })).toBeVisible();
  // The link opens that booth's record, not the first booth by name.
  await expect(page.getByLabel('Booth', { exact: true }).locator('option:checked')).toHaveText('Booth 1 (cross-draft)');
  await page.goBack();

  await room.getByRole('link', { name: `Plan ${sprayRoom} in the booth planner` }).click();
  await expect(page.getByRole('heading', { name: 'Booth planner', level: 1 })).toBeVisible();
  await expect(page.getByLabel('Go to day')).toHaveValue(today);
});

test('a sprayer sees their session today with the next thing to do, and opens it', async ({ page }) => {
  await page.setViewportSize({ width: 1024, height: 768 });
  await signIn(page, 'sprayer', '/');
  const mine = page.getByRole('region', { name: 'My sessions today' });
  const session = mine.getByRole('listitem').filter({ hasText: hours }).filter({ hasText: sprayRoom });
  await expect(session).toContainText('LJ-26-103 · coat 1 of 2: Kestrel Sanding Sealer NC · Natural');
  await expect(session).toContainText('Next: Run the pre-spray checklist');
  await page.screenshot({ path: '/tmp/shots/today-sprayer-1024.png', fullPage: true });
  await page.setViewportSize({ width: 390, height: 844 });
  await page.screenshot({ path: '/tmp/shots/today-sprayer-390.png', fullPage: true });
  await session.getByRole('link', { name: 'Open the session' }).click();
  await expect(page).toHaveURL(/\/spray-sessions\/\d+$/);
  await expect(page.getByRole('heading', { name: sprayRoom, level: 1 })).toBeVisible();
});

test('a lead’s day reads on a phone', async ({ page }) => {
  await page.setViewportSize({ width: 390, height: 844 });
  await signIn(page, 'lead', '/');
  await expect(page.getByRole('heading', { name: 'Booths, today and tomorrow' })).toBeVisible();
  await expect(page.getByRole('region', { name: sprayRoom, exact: true }).getByRole('link', { name: hours })).toBeVisible();
  await page.screenshot({ path: '/tmp/shots/today-lead-390.png', fullPage: true });
});

test('an assembler lands on the ready board, which is their day', async ({ page }) => {
  await page.setViewportSize({ width: 1024, height: 768 });
  await signIn(page, 'assembler', '/');
  await expect(page).toHaveURL(/\/ready$/);
  await expect(page.getByRole('heading', { name: 'Ready board', level: 1 })).toBeVisible();
  await expect(mainNav(page).getByRole('link', { name: 'Today', exact: true })).toHaveCount(0);
  await page.screenshot({ path: '/tmp/shots/today-assembler-1024.png', fullPage: true });
});

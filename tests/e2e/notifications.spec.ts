import { request } from '@playwright/test';
import { expect, test } from './fixtures';
import { demo, demoPassword, mainNav, signIn } from './helpers';

const shopZone = 'Europe/London';

/** `YYYY-MM-DDT09:00` on the shop's wall clock as an instant with the zone's offset that day. */
function shopInstant(day: Date, hour: number): string {
  const date = day.toISOString().slice(0, 10);
  const offsetName = new Intl.DateTimeFormat('en-GB', { timeZone: shopZone, timeZoneName: 'longOffset' })
    .formatToParts(new Date(`${date}T12:00:00Z`))
    .find((p) => p.type === 'timeZoneName')!.value;
  const offset = offsetName === 'GMT' ? '+00:00' : offsetName.slice(3);
  return `${date}T${String(hour).padStart(2, '0')}:00:00${offset}`;
}

/** As the lead, books Mina (sprayer id 3) into booth 1 for 09:00–10:00 on the first free weekday a while ahead. */
async function leadBooksSprayer(baseURL: string): Promise<number> {
  const context = await request.newContext({ baseURL });
  const token = async () => (await (await context.get('/api/auth/csrf')).json()).token as string;
  const login = await context.post('/api/auth/login', { headers: { 'x-csrf-token': await token() }, data: { email: demo.lead.email, password: demoPassword } });
  expect(login.ok()).toBe(true);
  const csrf = await token();
  // Earlier runs on the same database may have taken some days already: move on until one is free.
  const day = new Date(Date.now() + (20 + Math.floor(Math.random() * 200)) * 86_400_000);
  for (let tries = 0; tries < 30; tries += 1, day.setUTCDate(day.getUTCDate() + 1)) {
    if (day.getUTCDay() === 0 || day.getUTCDay() === 6) continue;
    const res = await context.post('/api/spray-sessions', {
      headers: { 'x-csrf-token': csrf },
      data: { boothId: 1, start: shopInstant(day, 9), end: shopInstant(day, 10), sprayerId: 3 },
    });
    if (res.status() === 409) continue;
    expect(res.ok(), `POST /api/spray-sessions: ${await res.text()}`).toBe(true);
    const { spraySession } = (await res.json()) as { spraySession: { id: number } };
    await context.dispose();
    return spraySession.id;
  }
  throw new Error('No free weekday found for booth 1');
}

test.describe('e-mail notifications', () => {
  test('a user’s choice of e-mails is kept after a reload', async ({ page }) => {
    await signIn(page, 'assembler', '/settings/preferences');
    const fieldset = page.getByRole('group', { name: 'E-mail me about' });
    const dailyPlan = fieldset.getByRole('checkbox', { name: 'The day’s plan, each morning' });
    const wasTicked = await dailyPlan.isChecked();
    await dailyPlan.setChecked(!wasTicked);
    await page.getByRole('button', { name: 'Save preferences' }).click();
    await expect(page.getByText('Your preferences are saved.')).toBeVisible();

    await page.reload();
    await expect(page.getByRole('checkbox', { name: 'The day’s plan, each morning' })).toBeChecked({ checked: !wasTicked });
    await expect(page.getByRole('heading', { name: 'Recent notifications' })).toBeVisible();
  });

  test('the admin finds a booking e-mail in the development mailbox', async ({ page, baseURL }) => {
    test.slow();
    test.setTimeout(150_000);
    await signIn(page, 'admin');
    await mainNav(page).getByRole('link', { name: 'Mailbox' }).click();
    await expect(page.getByRole('heading', { name: 'Mailbox' })).toBeVisible();

    const sessionId = await leadBooksSprayer(baseURL!);
    // The scheduler runs once a minute and the page looks again every 10 s: no reload needed.
    const message = page
      .getByRole('list', { name: 'Caught e-mails' })
      .getByRole('listitem')
      .filter({ hasText: demo.sprayer.email })
      .filter({ hasText: 'Spray session booked or moved' })
      // Other tests book sessions for the same sprayer: this one is the message linking to our session.
      .filter({ hasText: new RegExp(`/spray-sessions/${sessionId}(?!\\d)`) });
    await expect(message).toBeVisible({ timeout: 90_000 });
    await message.locator('summary').click();
    // The e-mail names the booth and the shop time, never the session's number.
    await expect(message.getByText(/Your spray session in Booth 1 \(cross-draft\), .*09:00.*, is booked or moved\./)).toBeVisible();
  });

  test('a lead has no Mailbox in the navigation', async ({ page }) => {
    await signIn(page, 'lead');
    await expect(mainNav(page).getByRole('link', { name: 'My preferences' })).toBeVisible();
    await expect(mainNav(page).getByRole('link', { name: 'Mailbox' })).toHaveCount(0);
  });
});

import type { Coat } from '../../shared/schemas/coat';
import type { List } from '../../shared/schemas/common';
import type { Job } from '../../shared/schemas/job';
import type { Part } from '../../shared/schemas/part';
import type { Product } from '../../shared/schemas/product';
import type { SpraySession } from '../../shared/schemas/spray-session';
import { expect, shotsDir, test } from './fixtures';
import { signIn } from './helpers';
import { leadApi, type LeadApi } from './lead-api';

const warnedCoats = 25;

/**
 * A job of its own on the demo painted system, with 25 primer coats logged in a cold, damp booth:
 * each carries the dew point, humidity and cold warnings (four or more). Recorded through the API:
 * what is tested is how the log shows them.
 */
async function coldMorning(api: LeadApi): Promise<{ jobId: number; reference: string }> {
  const now = Date.now();
  const reference = `LOG-${String(now).slice(-7)}`;
  const painted = (await api.get<List<Job>>('/api/jobs?q=LJ-26-105')).items[0];
  const { job } = await api.send<{ job: Job }>('POST', '/api/jobs', { customer: 'Coat Log Test Ltd', reference, dueDate: '2030-01-31', finishSystemId: painted.finishSystemId });
  const { booth } = await api.send<{ booth: { id: number } }>('POST', '/api/booths', { name: `Log booth ${now}`, kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000 });
  const { spraySession } = await api.send<{ spraySession: SpraySession }>('POST', '/api/spray-sessions', {
    boothId: booth.id,
    start: new Date(now - 3 * 3_600_000).toISOString(),
    end: new Date(now + 3_600_000).toISOString(),
    override: { reason: 'Browser test: booked whatever the hour' },
  });
  const primer = (await api.get<List<Product>>('/api/products?q=PU Primer')).items[0];
  for (let n = 1; n <= warnedCoats; n += 1) {
    const { part } = await api.send<{ part: Part }>('POST', `/api/jobs/${job.id}/parts`, { label: `Panel ${n}`, lengthMm: 700, widthMm: 400, thicknessMm: 18 });
    await api.send('POST', '/api/coats', {
      spraySessionId: spraySession.id,
      partIds: [part.id],
      productId: primer.id,
      sprayedAt: new Date(now - (warnedCoats - n + 1) * 5 * 60_000).toISOString(),
      airTempC: 12.5,
      relativeHumidityPct: 82,
      surfaceTempC: 11.7,
    });
  }
  return { jobId: job.id, reference };
}

test('the coat log shows each coat as coat n of m of its job, its warnings as chips that open by click and by keyboard, and 25 warned coats stay a page long', async ({ page, baseURL }) => {
  test.slow();
  const api = await leadApi(baseURL!);
  const { jobId, reference } = await coldMorning(api);
  const [newest] = (await api.get<List<Coat>>(`/api/coats?jobId=${jobId}`)).items;
  expect(newest.warnings.length).toBeGreaterThanOrEqual(4);

  await page.setViewportSize({ width: 1440, height: 900 });
  await signIn(page, 'lead', `/coat-log?job=${jobId}`);
  const log = page.getByRole('region', { name: 'Coat records' });
  const rows = log.getByRole('row', { name: new RegExp(`^Panel \\d+, ${reference}, coat 1 of 3, `) });
  await expect(rows).toHaveCount(warnedCoats);
  await expect(log.getByRole('columnheader', { name: 'Job' })).toBeVisible();
  await expect(log).not.toContainText(/Step \d|#\d/);

  // 25 rows of four or more warnings each: short chips keep the table to a page or so.
  const height = (await log.boundingBox())!.height;
  expect(height).toBeLessThan(2500);

  const row = rows.first();
  await expect(row).toHaveAccessibleName(new RegExp(`^Panel 25, ${reference}, coat 1 of 3, \\w{3},? \\d{1,2} \\w{3}, \\d{2}:\\d{2}$`));
  await expect(row).toContainText('Coat 1 of 3');
  await expect(row).toContainText('Panel 25');
  const dewPoint = row.getByRole('button', { name: 'Dew point' });
  const humidity = row.getByRole('button', { name: 'Humidity' });
  await expect(dewPoint).toHaveAttribute('aria-expanded', 'false');
  await expect(row).not.toContainText('Moisture can condense');

  // A click (or a tap) opens the full warning; another closes it.
  await dewPoint.click();
  await expect(dewPoint).toHaveAttribute('aria-expanded', 'true');
  await expect(row).toContainText('above the dew point');
  await expect(row).toContainText('Moisture can condense on the part and spoil the finish.');
  await page.screenshot({ path: `${shotsDir}/coat-log-chips-1440.png`, fullPage: true });
  await dewPoint.click();
  await expect(dewPoint).toHaveAttribute('aria-expanded', 'false');
  await expect(row).not.toContainText('Moisture can condense');

  // By keyboard: Tab reaches the next chip, Enter opens it, Space closes it.
  await dewPoint.focus();
  await page.keyboard.press('Tab');
  await expect(humidity).toBeFocused();
  await page.keyboard.press('Enter');
  await expect(humidity).toHaveAttribute('aria-expanded', 'true');
  await expect(row).toContainText(/Humidity 82 % is above/);
  await page.keyboard.press('Space');
  await expect(humidity).toHaveAttribute('aria-expanded', 'false');

  // On a tablet the same chips are cards' chips, big enough for a gloved finger.
  await page.setViewportSize({ width: 820, height: 1180 });
  const card = page.getByRole('listitem', { name: new RegExp(`^Panel 25, ${reference}, coat 1 of 3, `) });
  const chip = card.getByRole('button', { name: 'Humidity' });
  expect((await chip.boundingBox())!.height).toBeGreaterThanOrEqual(44);
  await chip.click();
  await expect(card).toContainText(/Humidity 82 % is above/);
  await api.context.dispose();
});

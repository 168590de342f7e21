import { demoIds } from './axe-walk';
import { box, checkAndStart } from './booth-steps';
import { expect, test } from './fixtures';
import { signIn } from './helpers';
import { leadApi } from './lead-api';
import { smallTargets } from './tap-targets';

// A booth tablet held landscape, and the same tablet turned upright.
const tablets = [
  { width: 1024, height: 768 },
  { width: 768, height: 1024 },
];


for (const viewport of tablets) {
  test.describe(`on a ${viewport.width} × ${viewport.height} tablet`, () => {
    test.use({ viewport });

    test('every control of a spray session is big enough for a gloved finger, from the checklist to the coat form', async ({ page, baseURL }) => {
      test.setTimeout(120_000);
      const api = await leadApi(baseURL!);
      const { session, cancel } = await demoIds(api, true);
      try {
        await signIn(page, 'sprayer', `/spray-sessions/${session}`);
        await expect(page.getByRole('heading', { name: 'Booth 1 (cross-draft)', level: 1 })).toBeVisible();
        expect(await smallTargets(page), 'the pre-spray checklist').toEqual([]);

        await checkAndStart(page);

        await page.getByRole('button', { name: 'Record a mix' }).click();
        await expect(box(page, 'Amount to mix')).toBeVisible();
        expect(await smallTargets(page), 'the mix form').toEqual([]);
        await box(page, 'Amount to mix').fill('3');
        await page.getByRole('button', { name: 'Record mix' }).click();

        const coatForm = page.getByRole('region', { name: 'Record a coat' });
        await coatForm.getByRole('button', { name: 'Planned parts' }).click();
        await expect(coatForm.getByRole('checkbox').first()).toBeVisible();
        expect(await smallTargets(page), 'the coat form with its planned parts').toEqual([]);
      } finally {
        await cancel();
        await api.context.dispose();
      }
    });

    test('every control of the auto-plan dialog is big enough to tap', async ({ page }) => {
      await signIn(page, 'lead', '/planner');
      await page.getByRole('button', { name: 'Auto-plan jobs' }).click();
      const dialog = page.getByRole('dialog', { name: 'Auto-plan jobs' });
      await dialog.getByRole('checkbox', { name: /LJ-26-105/ }).check();
      expect(await smallTargets(dialog), 'choosing the jobs').toEqual([]);
      await dialog.getByRole('button', { name: 'Propose a plan' }).click();
      await expect(dialog.getByRole('table', { name: 'Proposed spray sessions' })).toBeVisible();
      expect(await smallTargets(dialog), 'the proposal').toEqual([]);
    });

    test('every control of my preferences is big enough to tap', async ({ page }) => {
      await signIn(page, 'sprayer', '/settings/preferences');
      await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
      expect(await smallTargets(page)).toEqual([]);
    });
  });
}

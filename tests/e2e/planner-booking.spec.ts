import { expect, test } from './fixtures';
import { signIn } from './helpers';
import { bookThroughForm, booth, boothCalendar, calendarEvent, dragAcrossFreeTime, sprayRoom, summerWeek } from './planner-helpers';

// Booking the way the planner's help text says: press on free time and drag across it.
const { wednesday, thursday } = summerWeek();

test.use({ timezoneId: 'America/New_York' });
test.describe.configure({ mode: 'serial' });

test.describe('booking by dragging across free time', () => {
  test('at 1366 px in the week view: the form opens on that booth and time, offers the site’s sprayers, and the block says what it sprays', async ({ page }) => {
    await page.setViewportSize({ width: 1366, height: 900 });
    await signIn(page, 'lead', '/planner');
    await page.getByLabel('Go to day').fill(wednesday);
    await dragAcrossFreeTime(page, boothCalendar(page), wednesday, '09:00', '10:30');
    const dialog = page.getByRole('dialog', { name: 'Book a spray session' });
    // The lead chooses among the site's active sprayers and leads, not only themself.
    const choices = dialog.getByLabel('Sprayer').locator('option');
    await expect(choices).toHaveText(['Not assigned yet', 'Dev Okafor (me)', 'Mina Castell']);
    await bookThroughForm(page, { booth, start: `${wednesday}T09:00`, end: `${wednesday}T10:30` }, { label: 'LJ-26-101 · Hartfield Kitchen Co.', parts: 42 }, 'Mina Castell');
    const block = calendarEvent(page, 'LJ-26-101').filter({ hasText: /^09:00–10:30/ });
    await expect(block).toContainText('LJ-26-101 · coat 1 of 3');
    await expect(block).toContainText('Kestrel 2K PU Primer White · Sage grey (customer sample 14)');
    await expect(block).toContainText('42 parts');
    await expect(block).toContainText('Mina Castell');

    // The spray room at the same hour: each booth keeps its own lane, so neither block is squeezed to half a day.
    await dragAcrossFreeTime(page, boothCalendar(page, sprayRoom), wednesday, '09:00', '10:30');
    await bookThroughForm(page, { booth: sprayRoom, start: `${wednesday}T09:00`, end: `${wednesday}T10:30` }, { label: 'LJ-26-104 · St Brannock School', parts: 18 });
    const roomBlock = calendarEvent(page, 'LJ-26-104', sprayRoom);
    await expect(roomBlock).toContainText(sprayRoom);
    for (const [calendar, shown] of [[boothCalendar(page), block], [boothCalendar(page, sprayRoom), roomBlock]] as const) {
      const column = (await calendar.locator(`.fc-timegrid-col[data-date="${wednesday}"]`).boundingBox())!;
      expect((await shown.boundingBox())!.width).toBeGreaterThan(column.width * 0.85);
    }
    await page.screenshot({ path: '/tmp/shots/planner-drag-booked-1366.png', fullPage: true });
  });

  test('at 1024 px in the day view: dragging in a booth’s column books that booth', async ({ page }) => {
    await page.setViewportSize({ width: 1024, height: 768 });
    await signIn(page, 'lead', '/planner');
    await page.getByRole('button', { name: 'Day', exact: true }).click();
    await page.getByLabel('Go to day').fill(thursday);
    await dragAcrossFreeTime(page, boothCalendar(page, sprayRoom), thursday, '11:00', '12:00');
    await bookThroughForm(page, { booth: sprayRoom, start: `${thursday}T11:00`, end: `${thursday}T12:00` }, { label: 'LJ-26-103 · Penhallow Interiors', parts: 18 });
    await expect(calendarEvent(page, 'LJ-26-103', sprayRoom)).toContainText('11:00–12:00');
    await page.screenshot({ path: '/tmp/shots/planner-day-1024.png', fullPage: true });
  });

  test('on a 390 px phone the planner falls back to the day view, and dragging still books', async ({ page }) => {
    await page.setViewportSize({ width: 390, height: 844 });
    await signIn(page, 'lead', '/planner');
    await expect(page.getByText('Day view on a narrow screen')).toBeVisible();
    await page.getByLabel('Go to day').fill(thursday);
    await dragAcrossFreeTime(page, boothCalendar(page), thursday, '08:00', '09:00');
    await bookThroughForm(page, { booth, start: `${thursday}T08:00`, end: `${thursday}T09:00` }, { label: 'LJ-26-102 · Morrow & Daughters Cabinetmakers', parts: 80 });
    await expect(calendarEvent(page, 'LJ-26-102')).toContainText('08:00–09:00');
    await page.screenshot({ path: '/tmp/shots/planner-phone-390.png', fullPage: true });
  });
});


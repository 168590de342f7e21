import { expect, test } from './fixtures';
import { mainNav, signIn } from './helpers';
import { booth, boothCalendar, calendarEvent, drag, openBookingForm, summerWeek } from './planner-helpers';

// The browser sits in New York, so a time that shows right can only come from the shop's zone
// (Europe/London), not the device's.
const { tuesday, saturday } = summerWeek();

test.use({ timezoneId: 'America/New_York' });
test.describe.configure({ mode: 'serial' });

test.describe('booth planner', () => {
  test('a lead books a session from the form and sees it at 09:00 shop time, whatever the device’s zone', async ({ page }) => {
    await signIn(page, 'lead', '/');
    await mainNav(page).getByRole('link', { name: 'Booth planner' }).click();
    await expect(page.getByRole('heading', { name: 'Booth planner', level: 1 })).toBeVisible();

    const dialog = await openBookingForm(page, `${tuesday}T09:00`, `${tuesday}T10:00`);
    await dialog.getByLabel('Job').selectOption({ label: 'LJ-26-105 · Ardent Bathrooms' });
    await expect(dialog.getByLabel('Coat')).toHaveValue('0');
    await dialog.getByRole('button', { name: 'Choose all 8 parts' }).click();
    await expect(dialog.getByText('8 parts chosen')).toBeVisible();
    // 15 min set-up and 20 min clean-down (the shop's defaults) around the spraying itself.
    await expect(dialog.getByText(/Suggested length \d+ min: [\d.]+ m² at 24 m²\/h in Booth 1 \(cross-draft\), plus 15 min set-up and 20 min clean-down/)).toBeVisible();
    const useEnd = dialog.getByRole('button', { name: /^End at \d\d:\d\d$/ });
    const suggestedEnd = (await useEnd.textContent())!.replace('End at ', '');
    await useEnd.click();
    await expect(dialog.getByLabel('Ends')).toHaveValue(`${tuesday}T${suggestedEnd}`);
    await dialog.getByLabel('Notes').fill('Primer coat on the vanity doors.');
    await dialog.getByRole('button', { name: 'Book session' }).click();
    await expect(dialog).toBeHidden();

    // The calendar jumps to the booked week; the session says what it sprays, its state and sprayer in words.
    const event = calendarEvent(page, 'LJ-26-105');
    await expect(event).toContainText('Planned');
    await expect(event).toContainText('LJ-26-105 · coat 1 of 3');
    await expect(event).toContainText('Kestrel 2K PU Primer White · Ink blue');
    await expect(event).toContainText('8 parts');
    await expect(event).toContainText('No sprayer yet');
    await expect(event).toContainText(booth);
    await expect(event).toContainText(`09:00–${suggestedEnd}`);
    // It sits on the 09:00 row of its booth's grid, and the server holds 08:00 UTC.
    const slot = await boothCalendar(page).locator('.fc-timegrid-slot-lane[data-time="09:00:00"]').boundingBox();
    const block = await event.boundingBox();
    expect(Math.abs(block!.y - slot!.y)).toBeLessThan(3);
    const stored = await page.request.get(`/api/spray-sessions?from=${tuesday}T00:00:00Z&to=${tuesday}T23:59:00Z`);
    const { items } = (await stored.json()) as { items: { start: string; boothName: string }[] };
    expect(items.find((s) => s.boothName === booth)?.start).toBe(`${tuesday}T08:00:00.000Z`);
    await expect(page.getByRole('button', { name: /09:00–\d\d:\d\d(?! BST)(?! GMT).*Booth 1 \(cross-draft\).*Planned.*LJ-26-105 · coat 1 of 3: Kestrel 2K PU Primer White · Ink blue · 8 parts/ })).toBeVisible();
    await page.screenshot({ path: '/tmp/shots/planner-week-1280.png', fullPage: true });
  });

  test('an overlapping booking is refused with the reason in words', async ({ page }) => {
    await signIn(page, 'lead', '/planner');
    const dialog = await openBookingForm(page, `${tuesday}T09:30`, `${tuesday}T10:30`);
    await dialog.getByRole('button', { name: 'Book session' }).click();
    await expect(dialog.getByRole('alert')).toContainText(/Booth 1 \(cross-draft\) is already booked .*09:00–.*\d\d:\d\d/);
    await expect(dialog.getByRole('button', { name: 'Book anyway' })).toHaveCount(0);
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    await expect(dialog).toBeHidden();
  });

  test('a Saturday booking goes ahead only with a reason, and the summary shows it with the cautions', async ({ page }) => {
    await signIn(page, 'lead', '/planner');
    const dialog = await openBookingForm(page, `${saturday}T10:00`, `${saturday}T11:00`);
    await dialog.getByRole('button', { name: 'Book session' }).click();
    await expect(dialog.getByRole('alert')).toContainText('The booth is closed on Saturdays. A lead may book it anyway with a reason.');
    await dialog.getByRole('button', { name: 'Book anyway' }).click();
    await expect(dialog.getByText('Say why this booking goes ahead anyway')).toBeVisible();
    await expect(dialog).toBeVisible();
    await dialog.getByLabel('Reason for booking anyway').fill('Rush order for Ardent Bathrooms; overtime agreed');
    await dialog.getByRole('button', { name: 'Book anyway' }).click();
    await expect(dialog).toBeHidden();

    const event = calendarEvent(page, '10:00–11:00');
    await expect(event).toContainText('Planned');
    await event.click();
    // Named as people name it: booth and start time, never a record number.
    const summary = page.getByRole('dialog', { name: /^Spray session: .+, \w{3} \d{1,2} \w{3}, 10:00$/ });
    await expect(summary).toContainText(/Booked outside opening hours because:\s*Rush order for Ardent Bathrooms; overtime agreed/);
    await expect(summary.getByRole('heading', { name: 'Safety cautions' })).toBeVisible();
    await expect(summary).toContainText('Not worked out: no products are known for this session yet.');
    await expect(summary).toContainText('These are reminders, not a risk assessment.');
    await expect(summary.getByRole('link', { name: 'Open the spray session' })).toHaveAttribute('href', /^\/spray-sessions\/\d+$/);
    await page.setViewportSize({ width: 1024, height: 768 });
    await page.screenshot({ path: '/tmp/shots/planner-summary-1024.png' });
  });

  test('a sprayer sees the plan read-only, with the cautions the booked coat calls for', async ({ page }) => {
    await page.setViewportSize({ width: 1024, height: 768 });
    await signIn(page, 'sprayer', '/planner');
    await expect(page.getByRole('heading', { name: 'Booth planner', level: 1 })).toBeVisible();
    await page.getByLabel('Go to day').fill(tuesday);
    const event = calendarEvent(page, '09:00–');
    await expect(event).toContainText('Planned');
    await expect(page.getByRole('button', { name: /Book/ })).toHaveCount(0);
    await expect(event).not.toHaveClass(/fc-event-draggable/);
    await page.screenshot({ path: '/tmp/shots/planner-sprayer-1024.png', fullPage: true });

    await event.click();
    const summary = page.getByRole('dialog', { name: /^Spray session: .+, 09:00$/ });
    await expect(summary).toContainText('Planned parts (8)');
    await expect(summary).toContainText('Kestrel 2K PU Primer White');
    // The primer is an isocyanate: the strictest protection, and the SDS has the last word.
    await expect(summary).toContainText('Air-fed respiratory protection');
    await expect(summary).toContainText('These are reminders, not a risk assessment.');
    await expect(summary.getByRole('button', { name: 'Cancel session' })).toHaveCount(0);
    await expect(summary.getByRole('button', { name: 'Change booking' })).toHaveCount(0);
  });
});

test.describe('booth planner, dragging', () => {
  test.use({ viewport: { width: 1280, height: 1000 } });

  test('a lead drags a session to a later time; a drag onto a closed day goes back with the reason', async ({ page }) => {
    await signIn(page, 'lead', '/planner');
    await page.getByLabel('Go to day').fill(tuesday);
    const calendar = boothCalendar(page);
    await calendar.scrollIntoViewIfNeeded();
    const event = calendarEvent(page, 'LJ-26-105').filter({ hasText: /^09:00–/ });
    const from = (await event.boundingBox())!;
    const elevenOClock = (await calendar.locator('.fc-timegrid-slot-lane[data-time="11:00:00"]').boundingBox())!;
    await drag(page, { x: from.x + from.width / 2, y: from.y + 6 }, { x: from.x + from.width / 2, y: elevenOClock.y + 6 });

    const moved = calendarEvent(page, 'LJ-26-105').filter({ hasText: /^11:00–/ });
    await expect(moved).toBeVisible();
    await expect(page.getByText(/Moved: Booth 1 \(cross-draft\), .*11:00–/)).toBeVisible();
    const stored = await page.request.get(`/api/spray-sessions?from=${tuesday}T00:00:00Z&to=${tuesday}T23:59:00Z`);
    const { items } = (await stored.json()) as { items: { start: string }[] };
    expect(items.map((s) => s.start)).toContain(`${tuesday}T10:00:00.000Z`);

    // Sideways onto Saturday at the same time (after the 10:00–11:00 booking there): the booth is
    // closed, so the server refuses, the block goes back and the lead is asked for a reason.
    const block = (await moved.boundingBox())!;
    const saturdayColumn = (await calendar.locator('.fc-col-header-cell.fc-day-sat').boundingBox())!;
    await drag(page, { x: block.x + block.width / 2, y: block.y + 6 }, { x: saturdayColumn.x + saturdayColumn.width / 2, y: block.y + 6 });
    const ask = page.getByRole('dialog', { name: 'Outside opening hours' });
    await expect(ask).toContainText('The booth is closed on Saturdays. A lead may book it anyway with a reason.');
    await page.screenshot({ path: '/tmp/shots/planner-drag-refused-1280.png' });
    await ask.getByRole('button', { name: 'Leave it where it was' }).click();
    await expect(ask).toBeHidden();
    await expect(moved).toBeVisible();
    await expect(calendar.locator('.fc-day-sat .fc-timegrid-event', { hasText: /^11:00–/ })).toHaveCount(0);
  });

  test('while the next coat is dragged its recoat window shows on the calendar, and the move can be undone', async ({ page }) => {
    await signIn(page, 'lead', '/planner');
    const dialog = await openBookingForm(page, `${tuesday}T15:00`, `${tuesday}T16:00`);
    await dialog.getByLabel('Job').selectOption({ label: 'LJ-26-105 · Ardent Bathrooms' });
    await dialog.getByLabel('Coat').selectOption('2');
    await dialog.getByRole('button', { name: 'Choose all 8 parts' }).click();
    await dialog.getByRole('button', { name: 'Book session' }).click();
    await expect(dialog).toBeHidden();
    const calendar = boothCalendar(page);
    const topcoat = calendarEvent(page, 'coat 2 of 3').filter({ hasText: /^15:00–16:00/ });
    await expect(topcoat).toContainText('Kestrel 2K PU Topcoat Satin · Ink blue');

    // The primer before it is booked, not sprayed: its window is worked out from that booking's end.
    await topcoat.scrollIntoViewIfNeeded();
    const from = (await topcoat.boundingBox())!;
    const fourOClock = (await calendar.locator('.fc-timegrid-slot-lane[data-time="16:00:00"]').boundingBox())!;
    await page.mouse.move(from.x + from.width / 2, from.y + 6);
    await page.mouse.down();
    await page.mouse.move(from.x + from.width / 2 + 4, from.y + 10, { steps: 4 });
    await page.mouse.move(from.x + from.width / 2, fourOClock.y + 6, { steps: 12 });
    await expect(calendar.locator('.bw-recoat-open').first()).toBeVisible();
    await expect(calendar.locator('.bw-recoat-too-soon').first()).toBeAttached();
    await expect(calendar.getByText(/Recoat window from .*\d\d:\d\d, no closing time \(from the booked coat before\)/)).toBeVisible();
    await page.screenshot({ path: '/tmp/shots/planner-recoat-window-1280.png' });
    await page.mouse.up();
    await expect(calendar.locator('.bw-recoat')).toHaveCount(0);

    const toast = page.locator('[data-sonner-toast]', { hasText: /Moved: Booth 1 \(cross-draft\), .*16:00–17:00/ });
    await expect(toast).toBeVisible();
    await expect(calendarEvent(page, 'coat 2 of 3').filter({ hasText: /^16:00–17:00/ })).toBeVisible();
    await toast.getByRole('button', { name: 'Undo' }).click();
    await expect(page.getByText(/Put back: Booth 1 \(cross-draft\), .*15:00–16:00/)).toBeVisible();
    await expect(calendarEvent(page, 'coat 2 of 3').filter({ hasText: /^15:00–16:00/ })).toBeVisible();
    const stored = await page.request.get(`/api/spray-sessions?from=${tuesday}T00:00:00Z&to=${tuesday}T23:59:00Z`);
    const { items } = (await stored.json()) as { items: { start: string; work: { coats: { coatNumber: number }[] } }[] };
    expect(items.find((s) => s.work.coats[0]?.coatNumber === 2)?.start).toBe(`${tuesday}T14:00:00.000Z`);
  });

  test('a lead changes the sprayer from the summary, cancels the session and undoes it', async ({ page }) => {
    await signIn(page, 'lead', '/planner');
    await page.getByLabel('Go to day').fill(tuesday);
    await calendarEvent(page, 'LJ-26-105').filter({ hasText: /^11:00–/ }).click();
    const summary = page.getByRole('dialog', { name: /^Spray session: .+, 11:00$/ });
    await summary.getByRole('button', { name: 'Change booking' }).click();
    const form = page.getByRole('dialog', { name: /^Change the spray session: .+, 11:00$/ });
    await expect(form.getByText('Keeps its 8 planned parts unless you choose others.')).toBeVisible();
    await form.getByLabel('Sprayer').selectOption({ label: 'Dev Okafor (me)' });
    await form.getByRole('button', { name: 'Save changes' }).click();
    await expect(form).toBeHidden();
    const event = calendarEvent(page, 'LJ-26-105').filter({ hasText: /^11:00–/ });
    await expect(event).toContainText('Planned');
    await expect(event).toContainText('Dev Okafor');

    // …and gives it to the sprayer instead.
    await event.click();
    await summary.getByRole('button', { name: 'Change booking' }).click();
    await form.getByLabel('Sprayer').selectOption({ label: 'Mina Castell' });
    await form.getByRole('button', { name: 'Save changes' }).click();
    await expect(form).toBeHidden();
    await expect(event).toContainText('Mina Castell');

    await event.click();
    await summary.getByRole('button', { name: 'Cancel session' }).click();
    await expect(summary).toBeHidden();
    const toast = page.locator('[data-sonner-toast]', { hasText: 'Cancelled: Booth 1 (cross-draft)' });
    await expect(toast).toBeVisible();
    await expect(event).toHaveCount(0);
    await page.getByLabel('Show cancelled sessions').check();
    await expect(event).toContainText('Cancelled');
    await expect(event.locator('.line-through', { hasText: 'Mina Castell' })).toBeVisible();
    await toast.getByRole('button', { name: 'Undo' }).click();
    await expect(page.getByText(/Back in the plan: Booth 1/)).toBeVisible();
    await expect(event).toContainText('Planned');
    await expect(event).toContainText('Mina Castell');
  });
});

import type { ViewMountArg } from '@fullcalendar/core';

/**
 * The time grid scrolls inside its own box, which has nothing focusable in a free stretch of the
 * day: put that box in the tab order so a keyboard user can reach it and scroll the hours with the
 * arrow keys. A focusable box must be something the grid may hold, so it becomes the grid's body row
 * group (its table section becomes plain layout), named for what it holds.
 */
export function makeGridScrollable({ el }: ViewMountArg) {
  el.querySelectorAll<HTMLElement>('.fc-scroller-liquid-absolute').forEach((scroller) => {
    scroller.closest('[role="rowgroup"]')?.setAttribute('role', 'presentation');
    scroller.setAttribute('role', 'rowgroup');
    scroller.setAttribute('aria-label', 'Hours of the day');
    scroller.tabIndex = 0;
  });
}

import type { ViewMountArg } from '@fullcalendar/core';

/**
 * The time grid scrolls inside its own box, which has nothing focusable in an empty stretch: put it
 * in the tab order so a keyboard user can reach it and scroll the hours with the arrow keys.
 */
export function makeGridScrollable({ el }: ViewMountArg) {
  el.querySelectorAll<HTMLElement>('.fc-scroller-liquid-absolute').forEach((scroller) => {
    scroller.tabIndex = 0;
  });
}

import type { CalendarApi, EventMountArg } from '@fullcalendar/core';
import { useRef } from 'react';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { recoatSourceId, recoatWindowSource } from '../utils/recoat-window-events';

const hide = (calendar: CalendarApi) => calendar.getEventSourceById(recoatSourceId)?.remove();

/**
 * From the moment a movable session is pressed until it is dropped, its parts' recoat window is
 * shaded behind the grid. The shading goes in on the press, not at the start of the drag: the
 * calendar does not redraw its events mid-drag.
 */
export function useRecoatShading(timeZone: string, canWrite: boolean) {
  const dragging = useRef(false);

  const pressed = (calendar: CalendarApi, id: string) => {
    // The calendar's own copy, so a block mounted before the last refresh shows today's window.
    const session = calendar.getEventById(id)?.extendedProps.session as SpraySession | undefined;
    const source = session && recoatWindowSource(session, timeZone);
    if (!source) return;
    hide(calendar);
    calendar.addEventSource(source);
    // A press that never became a drag (a click) takes the shading away again.
    document.addEventListener('pointerup', () => !dragging.current && hide(calendar), { once: true });
  };

  return {
    mounted: (arg: EventMountArg) => {
      if (!canWrite || !arg.event.startEditable || !arg.event.extendedProps.session) return;
      const id = arg.event.id;
      arg.el.addEventListener('pointerdown', () => pressed(arg.view.calendar, id));
    },
    dragStarted: () => {
      dragging.current = true;
    },
    dragStopped: (calendar: CalendarApi) => {
      dragging.current = false;
      hide(calendar);
    },
  };
}

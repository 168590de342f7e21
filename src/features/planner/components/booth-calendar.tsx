import type { BusinessHoursInput, DateSelectArg, EventClickArg, EventDropArg, EventInput } from '@fullcalendar/core';
import enGbLocale from '@fullcalendar/core/locales/en-gb';
import interactionPlugin, { type EventResizeDoneArg } from '@fullcalendar/interaction';
import FullCalendar from '@fullcalendar/react';
import timeGridPlugin from '@fullcalendar/timegrid';
import { useEffect, useRef } from 'react';
import '../planner-look.css';
import type { PlannerView } from '../utils/calendar-range';
import { useRecoatShading } from '../hooks/use-recoat-shading';
import { makeGridScrollable } from '../utils/keyboard-scroll';
import { shopTimeZonePlugin } from '../utils/shop-zone-plugin';
import { SessionEventContent } from './session-event-content';

export type SessionMoveArg = EventDropArg | EventResizeDoneArg;

export interface CalendarHandlers {
  onSelectRange: (start: Date, end: Date) => void;
  onOpenSession: (id: number) => void;
  onMove: (arg: SessionMoveArg) => void;
  /** True while a drag or resize is under way, so polling does not swap the events mid-gesture. */
  onInteracting: (busy: boolean) => void;
}

interface BoothCalendarProps extends CalendarHandlers {
  view: PlannerView;
  day: string;
  timeZone: string;
  events: EventInput[];
  businessHours: BusinessHoursInput;
  canWrite: boolean;
  label: string;
  /** Pixels; the grid scrolls inside it. */
  height?: number;
}

const plugins = [timeGridPlugin, interactionPlugin, shopTimeZonePlugin];
const clock = { hour: '2-digit', minute: '2-digit', hour12: false } as const;

/** A day's header as a tab: "Mon" small above "30 Nov" (the text comes in the shop's zone from the grid). */
function DayTab({ text }: { text: string }) {
  const [weekday, ...date] = text.split(' ');
  return (
    <span className="flex flex-col items-center leading-tight">
      <span className="text-[0.68rem] font-semibold tracking-wider text-maple-600 uppercase">{weekday}</span>
      <span className="text-sm font-semibold text-maple-900">{date.join(' ')}</span>
    </span>
  );
}

/** One time grid; the planner shows one per booth on the day view, or one for the week. */
export function BoothCalendar({ view, day, timeZone, events, businessHours, canWrite, label, height = 640, ...handlers }: BoothCalendarProps) {
  const calendarRef = useRef<FullCalendar>(null);
  const viewName = view === 'week' ? 'timeGridWeek' : 'timeGridDay';

  // initialView and initialDate only count on mount; later changes go through the calendar's API.
  useEffect(() => {
    calendarRef.current?.getApi().changeView(viewName, day);
  }, [viewName, day]);

  const select = (arg: DateSelectArg) => {
    arg.view.calendar.unselect();
    handlers.onSelectRange(arg.start, arg.end);
  };
  const click = (arg: EventClickArg) => {
    arg.jsEvent.preventDefault();
    if (arg.event.extendedProps.session) handlers.onOpenSession(Number(arg.event.id));
  };
  const shading = useRecoatShading(timeZone, canWrite);

  return (
    <div role="region" aria-label={label} className="bw-planner min-w-0 overflow-hidden rounded-panel border border-maple-300 bg-white text-sm [&_.fc-timegrid-slot]:h-6!">
      <FullCalendar
        ref={calendarRef}
        plugins={plugins}
        locale={enGbLocale}
        timeZone={timeZone}
        initialView={viewName}
        initialDate={day}
        headerToolbar={false}
        firstDay={1}
        allDaySlot={false}
        slotDuration="00:15:00"
        snapDuration="00:15:00"
        slotLabelInterval="01:00"
        scrollTime="06:30:00"
        scrollTimeReset={false}
        slotLabelFormat={clock}
        eventTimeFormat={clock}
        defaultRangeSeparator="–"
        dayHeaderFormat={{ weekday: 'short', day: 'numeric', month: 'short' }}
        dayHeaderContent={(arg) => <DayTab text={arg.text} />}
        height={height}
        expandRows={false}
        nowIndicator
        businessHours={businessHours}
        events={events}
        eventInteractive
        selectable={canWrite}
        selectMirror={canWrite}
        slotEventOverlap={false}
        eventMinHeight={28}
        selectLongPressDelay={400}
        eventLongPressDelay={400}
        eventBackgroundColor="#d5ece4"
        eventBorderColor="#1b5246"
        eventTextColor="#123630"
        editable={canWrite}
        eventDurationEditable={canWrite}
        select={select}
        eventClick={click}
        eventDrop={handlers.onMove}
        eventResize={handlers.onMove}
        eventDidMount={shading.mounted}
        viewDidMount={makeGridScrollable}
        eventDragStart={() => {
          shading.dragStarted();
          handlers.onInteracting(true);
        }}
        eventDragStop={(arg) => {
          shading.dragStopped(arg.view.calendar);
          handlers.onInteracting(false);
        }}
        eventResizeStart={() => handlers.onInteracting(true)}
        eventResizeStop={() => handlers.onInteracting(false)}
        eventContent={(arg) => <SessionEventContent arg={arg} />}
      />
    </div>
  );
}

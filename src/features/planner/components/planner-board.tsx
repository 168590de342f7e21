import type { EventInput } from '@fullcalendar/core';
import { useMemo } from 'react';
import type { Booth } from '../../../../shared/schemas/booth';
import type { PlannerSession } from '../api/get-spray-sessions';
import { businessHoursFor } from '../utils/business-hours';
import type { PlannerView } from '../utils/calendar-range';
import { toCalendarEvent } from '../utils/session-events';
import { BoothCalendar, type CalendarHandlers } from './booth-calendar';

const noEvents: EventInput[] = [];

interface PlannerBoardProps extends Omit<CalendarHandlers, 'onSelectRange'> {
  view: PlannerView;
  day: string;
  title: string;
  timeZone: string;
  booths: Booth[];
  sessions: PlannerSession[];
  canWrite: boolean;
  /** Null booth: the week view of several booths, where the form asks which one. */
  onSelectRange: (start: Date, end: Date, boothId: number | null) => void;
}

/**
 * The day view puts each booth in its own column, side by side, built from free parts: one time
 * grid per booth. The week view is one grid; each session names its booth.
 */
export function PlannerBoard({ view, day, title, timeZone, booths, sessions, canWrite, onSelectRange, ...handlers }: PlannerBoardProps) {
  const events = useMemo(() => sessions.map((session) => toCalendarEvent(session, canWrite)), [sessions, canWrite]);
  // One stable list per booth, so a re-render does not hand the calendars new arrays to re-read.
  const eventsByBooth = useMemo(() => {
    const byBooth = new Map<number, EventInput[]>();
    for (const event of events) {
      const { boothId } = event.extendedProps?.session as PlannerSession;
      byBooth.set(boothId, [...(byBooth.get(boothId) ?? []), event]);
    }
    return byBooth;
  }, [events]);
  const common = { view, day, timeZone, canWrite, ...handlers };

  if (view === 'week' || booths.length < 2) {
    const onlyBooth = booths.length === 1 ? booths[0].id : null;
    return (
      <BoothCalendar
        {...common}
        label={`Calendar, ${title}${onlyBooth ? `, ${booths[0].name}` : ', all booths'}`}
        events={events}
        businessHours={businessHoursFor(booths.map((booth) => booth.openingHours))}
        onSelectRange={(start, end) => onSelectRange(start, end, onlyBooth)}
      />
    );
  }

  return (
    <div className="grid auto-cols-[minmax(16rem,1fr)] grid-flow-col gap-3 overflow-x-auto pb-2">
      {booths.map((booth) => (
        <section key={booth.id} aria-labelledby={`planner-booth-${booth.id}`} className="min-w-0">
          <h3 id={`planner-booth-${booth.id}`} className="mb-1 truncate font-semibold text-lacquer-900">
            {booth.name}
          </h3>
          <BoothCalendar
            {...common}
            label={`Calendar, ${title}, ${booth.name}`}
            events={eventsByBooth.get(booth.id) ?? noEvents}
            businessHours={businessHoursFor([booth.openingHours])}
            onSelectRange={(start, end) => onSelectRange(start, end, booth.id)}
          />
        </section>
      ))}
    </div>
  );
}

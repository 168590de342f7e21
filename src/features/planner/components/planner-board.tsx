import type { EventInput } from '@fullcalendar/core';
import { useMemo } from 'react';
import type { Booth } from '../../../../shared/schemas/booth';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { businessHoursFor } from '../utils/business-hours';
import type { PlannerView } from '../utils/calendar-range';
import { toCalendarEvent } from '../utils/session-events';
import { BoothMark } from '../../../components/ui/booth-mark';
import type { BoothIdentity } from '../../../lib/booth-identity';
import { BoothCalendar, type CalendarHandlers } from './booth-calendar';

const noEvents: EventInput[] = [];

interface PlannerBoardProps extends Omit<CalendarHandlers, 'onSelectRange'> {
  view: PlannerView;
  day: string;
  title: string;
  timeZone: string;
  booths: Booth[];
  sessions: SpraySession[];
  canWrite: boolean;
  /** Each booth's look, from every booth at the site (not only those shown). */
  identities: Map<number, BoothIdentity>;
  /** Null booth: the week view of several booths, where the form asks which one. */
  onSelectRange: (start: Date, end: Date, boothId: number | null) => void;
}

/**
 * One time grid per booth, built from free parts: side by side for a day, one under another for
 * a week. A single booth (or a booth chosen in the filter) gets one grid.
 */
export function PlannerBoard({ view, day, title, timeZone, booths, sessions, canWrite, identities, onSelectRange, ...handlers }: PlannerBoardProps) {
  const events = useMemo(() => sessions.map((session) => toCalendarEvent(session, canWrite, identities.get(session.boothId))), [sessions, canWrite, identities]);
  // One stable list per booth, so a re-render does not hand the calendars new arrays to re-read.
  const eventsByBooth = useMemo(() => {
    const byBooth = new Map<number, EventInput[]>();
    for (const event of events) {
      const { boothId } = event.extendedProps?.session as SpraySession;
      byBooth.set(boothId, [...(byBooth.get(boothId) ?? []), event]);
    }
    return byBooth;
  }, [events]);
  const common = { view, day, timeZone, canWrite, ...handlers };

  if (booths.length < 2) {
    const onlyBooth = booths.length === 1 ? booths[0] : null;
    return (
      <BoothCalendar
        {...common}
        label={`Calendar, ${title}${onlyBooth ? `, ${onlyBooth.name}` : ''}`}
        events={events}
        businessHours={businessHoursFor(booths.map((booth) => booth.openingHours))}
        onSelectRange={(start, end) => onSelectRange(start, end, onlyBooth?.id ?? null)}
      />
    );
  }

  // A booth runs one session at a time, so a lane per booth never squeezes two blocks side by side:
  // the week stacks the booths' lanes, the day sets them side by side (stacked again on a phone).
  const layout = view === 'week' ? 'space-y-4' : 'grid gap-3 pb-2 sm:auto-cols-[minmax(16rem,1fr)] sm:grid-flow-col sm:overflow-x-auto';
  return (
    <div className={layout}>
      {booths.map((booth) => (
        <section key={booth.id} aria-labelledby={`planner-booth-${booth.id}`} className="min-w-0">
          <h3 id={`planner-booth-${booth.id}`} className="mb-1 flex items-center gap-2 font-semibold text-lacquer-900">
            <BoothMark identity={identities.get(booth.id)} className="h-5 w-3" />
            <span className="min-w-0 break-words">{booth.name}</span>
          </h3>
          <BoothCalendar
            {...common}
            label={`Calendar, ${title}, ${booth.name}`}
            height={view === 'week' ? 520 : 640}
            events={eventsByBooth.get(booth.id) ?? noEvents}
            businessHours={businessHoursFor([booth.openingHours])}
            onSelectRange={(start, end) => onSelectRange(start, end, booth.id)}
          />
        </section>
      ))}
    </div>
  );
}

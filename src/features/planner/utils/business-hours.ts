import type { BusinessHoursInput } from '@fullcalendar/core';
import type { OpeningSpan } from '../../../../shared/schemas/booth';

/**
 * Opening hours for FullCalendar's shading. ISO weekday 7 (Sunday) is its 0. A booth with no
 * hours set may be booked at any time, so nothing is shaded when any booth shown has none.
 */
export function businessHoursFor(openingHoursByBooth: OpeningSpan[][]): BusinessHoursInput {
  if (openingHoursByBooth.length === 0 || openingHoursByBooth.some((hours) => hours.length === 0)) return false;
  return openingHoursByBooth.flat().map((span) => ({ daysOfWeek: [span.weekday % 7], startTime: span.opens, endTime: span.closes }));
}

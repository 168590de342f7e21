/** The calendar date (YYYY-MM-DD) of an instant as seen on a wall clock in `timeZone`. */
export function calendarDateIn(instant: Date, timeZone: string): string {
  // en-CA formats dates as YYYY-MM-DD.
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(instant);
}

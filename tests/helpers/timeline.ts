const dayMs = 24 * 60 * 60 * 1000;

/**
 * Moves a test timeline written with fixed dates (easy to read and check) so that `firstDay`
 * becomes yesterday (UTC), every time of day kept. For tests that type instants of things that
 * happened, which the server holds close to its real clock.
 */
export function timelineStartingYesterday(firstDay: string): (instant: string) => string {
  const now = new Date();
  const yesterday = Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate()) - dayMs;
  const shift = yesterday - Date.parse(`${firstDay}T00:00:00Z`);
  return (instant) => new Date(Date.parse(instant) + shift).toISOString();
}

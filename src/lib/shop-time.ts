/** All times are shown in the shop's timezone, whatever the device is set to (DESIGN.md §3). */
export function formatShopDate(at: Date, timeZone: string): string {
  return new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'long', day: 'numeric', month: 'long', year: 'numeric' }).format(at);
}

export function formatShopClock(at: Date, timeZone: string): string {
  return new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(at);
}

export function formatShopDateTime(iso: string, timeZone: string): string {
  const at = new Date(iso);
  if (Number.isNaN(at.getTime())) return iso;
  return new Intl.DateTimeFormat('en-GB', {
    timeZone,
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
  }).format(at);
}

/** The zone's short name at that moment, e.g. "GMT" or "BST", so DST is visible. */
export function shopZoneName(at: Date, timeZone: string): string {
  const part = new Intl.DateTimeFormat('en-GB', { timeZone, timeZoneName: 'short' })
    .formatToParts(at)
    .find((p) => p.type === 'timeZoneName');
  return part?.value ?? timeZone;
}

const weekMs = 7 * 24 * 3_600_000;

/**
 * " BST" when a clock change is within a week either side of `at`, else "": the zone's name
 * matters only where a time could be read on the wrong side of a change; every other time is
 * plain shop time, as the page says once.
 */
export function zoneNearClockChange(at: Date, timeZone: string): string {
  const name = shopZoneName(at, timeZone);
  const near = [-weekMs, weekMs].some((step) => shopZoneName(new Date(at.getTime() + step), timeZone) !== name);
  return near ? ` ${name}` : '';
}

export function listTimeZones(): string[] {
  try {
    return Intl.supportedValuesOf('timeZone');
  } catch {
    return ['UTC'];
  }
}

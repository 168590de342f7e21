const dayMs = 86_400_000;
const dayPrefixes = new Map<number, string>();
const pad = (n: number, width: number) => String(n).padStart(width, '0');

/**
 * The same text as `new Date(ms).toISOString()`, several times faster: a million coats carry
 * nine instants each, and Date's own formatting was most of the seed's time.
 */
export function isoInstant(ms: number): string {
  const whole = Math.trunc(ms);
  const day = Math.floor(whole / dayMs);
  let prefix = dayPrefixes.get(day);
  if (prefix === undefined) {
    prefix = new Date(day * dayMs).toISOString().slice(0, 11);
    dayPrefixes.set(day, prefix);
  }
  let rest = whole - day * dayMs;
  const hours = Math.floor(rest / 3_600_000);
  rest -= hours * 3_600_000;
  const minutes = Math.floor(rest / 60_000);
  rest -= minutes * 60_000;
  const seconds = Math.floor(rest / 1000);
  return `${prefix}${pad(hours, 2)}:${pad(minutes, 2)}:${pad(seconds, 2)}.${pad(rest - seconds * 1000, 3)}Z`;
}

import type { Booth, OpeningSpan } from '../../../../shared/schemas/booth';

export const weekdayNames = ['Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday', 'Sunday'] as const;
const shortNames = ['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun'] as const;

/** "Mon–Fri 07:00–17:00; Sat 08:00–12:00": consecutive days with the same hours are joined. */
export function summariseOpeningHours(spans: OpeningSpan[]): string {
  if (spans.length === 0) return 'Closed every day';
  const sorted = [...spans].sort((a, b) => a.weekday - b.weekday || a.opens.localeCompare(b.opens));
  const groups: { from: number; to: number; hours: string }[] = [];
  for (const span of sorted) {
    const hours = `${span.opens}–${span.closes}`;
    const last = groups.at(-1);
    if (last && last.hours === hours && last.to === span.weekday - 1) last.to = span.weekday;
    else groups.push({ from: span.weekday, to: span.weekday, hours });
  }
  return groups
    .map(({ from, to, hours }) => `${shortNames[from - 1]}${to > from ? `–${shortNames[to - 1]}` : ''} ${hours}`)
    .join('; ');
}

export function faceVelocityShortfall(booth: Booth): boolean {
  return booth.faceVelocityMps !== null && booth.faceVelocityMps < booth.minFaceVelocityMps;
}

import type { Coat } from '../../../../shared/schemas/coat';
import { shopWhen } from '../utils/session-format';

/** The drying instants a coat record produced, in shop time. */
export function CoatTimes({ coat, timeZone, now }: { coat: Coat; timeZone: string; now: Date }) {
  const rows: [string, string][] = [
    ['Recoat from', shopWhen(coat.recoatOpensAt, timeZone, now)],
    ['Recoat by', coat.recoatClosesAt ? shopWhen(coat.recoatClosesAt, timeZone, now) : 'No limit'],
    ['Touch dry', shopWhen(coat.touchDryAt, timeZone, now)],
    ['Handle from', shopWhen(coat.handleAt, timeZone, now)],
    ['Stack or pack from', shopWhen(coat.packAt, timeZone, now)],
    ['Full cure', shopWhen(coat.fullCureAt, timeZone, now)],
  ];
  return (
    <dl className="grid grid-cols-2 gap-2 sm:grid-cols-3">
      {rows.map(([term, value]) => (
        <div key={term} className="rounded-panel bg-maple-50 p-2">
          <dt className="text-sm text-maple-700">{term}</dt>
          <dd className="font-bold">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

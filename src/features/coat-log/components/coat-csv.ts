import type { Coat } from '../../../../shared/schemas/coat';
import { formatShopDateTime } from '../../../lib/shop-time';
import { coatPlaceWords } from '../../../../shared/words';
import { warningWords } from './coat-log-format';

type Cell = string | number | null;

/**
 * One field of RFC 4180 CSV: always quoted, inner quotes doubled. Text that a spreadsheet would
 * run as a formula (=, +, -, @ first) gets a leading apostrophe; numbers are left as numbers.
 */
function csvField(value: Cell): string {
  if (value === null) return '""';
  const text = typeof value === 'number' ? String(value) : /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
  return `"${text.replaceAll('"', '""')}"`;
}

const columns: [string, (coat: Coat, timeZone: string) => Cell][] = [
  ['Coat', (c) => c.id],
  ['Version', (c) => c.version],
  ['Corrects coat', (c) => c.replacesId],
  ['Corrected by coat', (c) => c.supersededById],
  ['Correction reason', (c) => c.correctionReason],
  ['Sprayed (shop time)', (c, tz) => formatShopDateTime(c.sprayedAt, tz)],
  ['Sprayed (ISO)', (c) => c.sprayedAt],
  ['Spray session', (c) => c.spraySessionId],
  ['Job', (c) => c.jobReference],
  ['Parts', (c) => c.partIds.length],
  ['Part labels', (c) => c.partLabels.join(' | ')],
  ['Part ids', (c) => c.partIds.join(' ')],
  ['Product', (c) => c.productName],
  ['Lot id', (c) => c.lotId],
  ['Mix id', (c) => c.mixId],
  ['Coat of finish system', (c) => coatPlaceWords(c)],
  ['Thinning %', (c) => c.thinningPct],
  ['Wet film µm', (c) => c.wetFilmUm],
  ['Dry film µm', (c) => c.dryFilmUm],
  ['Air °C', (c) => c.airTempC],
  ['RH %', (c) => c.relativeHumidityPct],
  ['Surface °C', (c) => c.surfaceTempC],
  ['Dew point °C', (c) => c.dewPointC],
  ['Warnings', (c) => warningWords(c).join(' | ')],
  ['Notes', (c) => c.notes],
  ['Recorded by', (c) => c.recordedByName],
  ['Recorded (ISO)', (c) => c.recordedAt],
];

/** The coat log as CSV in stored (SI) units, so the figures match the data sheets whatever the viewer's units. */
export function coatsToCsv(coats: Coat[], timeZone: string): string {
  const header = columns.map(([name]) => csvField(name)).join(',');
  const rows = coats.map((coat) => columns.map(([, value]) => csvField(value(coat, timeZone))).join(','));
  return `${[header, ...rows].join('\r\n')}\r\n`;
}

export function downloadCsv(csv: string, fileName: string): void {
  // The byte-order mark makes spreadsheet programs read µ and ° as UTF-8.
  const url = URL.createObjectURL(new Blob(['\uFEFF', csv], { type: 'text/csv;charset=utf-8' }));
  const link = Object.assign(document.createElement('a'), { href: url, download: fileName });
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

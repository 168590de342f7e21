/**
 * The words Boothwright shows people, one per thing, in one place: screens, e-mails, CSV headers
 * and API messages take them from here. The trade's own terms: coat, denib, flash-off, recoat
 * window, pot life, dry film. Things are named as people name them (booth and start time, job
 * reference, coat n of m, product and mixing time), never by a database id.
 */
import type { RespiratorLevel } from './finishing/cautions';

export const terms = {
  coat: 'coat',
  denib: 'denib',
  flashOff: 'flash-off',
  recoatWindow: 'recoat window',
  potLife: 'pot life',
  dryFilm: 'dry film',
  wetFilm: 'wet film',
  spraySession: 'spray session',
  mix: 'mix',
  dewPoint: 'dew point',
  clearanceTime: 'clearance time',
} as const;

/** How the shop reads dates, times and money: its timezone, its locale (BCP 47) and its currency (ISO 4217). */
export type ShopFormat = { timeZone: string; locale: string };

/** The format of a shop's settings. */
export const shopFormatOf = (settings: { timezone: string; locale: string }): ShopFormat => ({ timeZone: settings.timezone, locale: settings.locale });

export const upperFirst = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/** "coat 2 of 3": the coat's place among the coat steps of its finish system. */
export function coatOfWords(coatNumber: number, coatsTotal: number): string {
  return coatsTotal > 0 ? `coat ${coatNumber} of ${coatsTotal}` : `coat ${coatNumber}`;
}

/** "coat 2 of 3" for the step at a position of a finish system, counting its coat steps only; null when that step is not a coat. */
export function coatAtStepWords(steps: ReadonlyArray<{ position: number; kind: string }>, position: number): string | null {
  const coats = steps.filter((step) => step.kind === 'coat');
  const index = coats.findIndex((step) => step.position === position);
  return index < 0 ? null : coatOfWords(index + 1, coats.length);
}

/** "denib with P320": sanding between coats. */
export const denibWords = (grit: string) => `denib with ${grit}`;

/** "Denib with P320 needed". */
export const denibNeededWords = (grit: string) => `${upperFirst(denibWords(grit))} needed`;

/** A step as one line: "Denib P320", "Coat 2 of 3 at 40 µm dry" (the coat's number among the coat steps; 0 when it is not one of them). */
export function stepLineWords(step: { kind: 'coat'; dryFilmUm: number; coatNumber: number; coatsTotal: number } | { kind: 'denib'; grit: string }): string {
  if (step.kind === 'denib') return `${upperFirst(terms.denib)} ${step.grit}`;
  return `${upperFirst(coatOfWords(step.coatNumber, step.coatsTotal))} at ${step.dryFilmUm} µm dry`;
}

/** "1 part", "3 parts". */
export const partsWords = (count: number) => `${count} ${count === 1 ? 'part' : 'parts'}`;

const formats = new Map<string, Intl.DateTimeFormat>();
function format(locale: string, timeZone: string, options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  const key = `${locale}|${timeZone}|${JSON.stringify(options)}`;
  let found = formats.get(key);
  if (!found) {
    found = new Intl.DateTimeFormat(locale, { timeZone, ...options });
    formats.set(key, found);
  }
  return found;
}

const timeOptions: Intl.DateTimeFormatOptions = { hour: '2-digit', minute: '2-digit' };
const dateOptions: Intl.DateTimeFormatOptions = { weekday: 'short', day: 'numeric', month: 'short' };

/** The wall-clock time in the shop, as its locale writes it ("09:15"); no zone name, the shop has one. */
export const shopTimeWords = (instant: Date, shop: ShopFormat) => format(shop.locale, shop.timeZone, timeOptions).format(instant);

/** The shop's day, as its locale writes it ("Tue 3 Mar"). */
export const shopDateWords = (instant: Date, shop: ShopFormat) => format(shop.locale, shop.timeZone, dateOptions).format(instant);

/** A shop calendar date (YYYY-MM-DD) as the locale writes it ("Wed 3 Mar 2027"); a date has no zone. */
export function calendarDateWords(date: string, locale: string): string {
  return format(locale, 'UTC', { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric' }).format(new Date(`${date}T12:00:00Z`));
}

/** "Tue 3 Mar, 09:15". */
export const shopMomentWords = (instant: Date, shop: ShopFormat) => `${shopDateWords(instant, shop)}, ${shopTimeWords(instant, shop)}`;

/** "Tue 3 Mar, 09:00–12:00"; a span past midnight names both days. */
export function shopSpanWords(start: Date, end: Date, shop: ShopFormat): string {
  const sameDay = shopDateWords(start, shop) === shopDateWords(end, shop);
  return `${shopMomentWords(start, shop)}–${sameDay ? shopTimeWords(end, shop) : shopMomentWords(end, shop)}`;
}

/** A spray session as people name it: "Booth 1, Tue 3 Mar, 09:00". */
export const spraySessionWords = (session: { boothName: string; startAt: Date }, shop: ShopFormat) => `${session.boothName}, ${shopMomentWords(session.startAt, shop)}`;

/** A mix (a pot) as people name it: "Kestrel 2K PU Primer White mixed at 09:15". */
export const mixWords = (mix: { productName: string; mixedAt: Date }, shop: ShopFormat) => `${mix.productName} mixed at ${shopTimeWords(mix.mixedAt, shop)}`;

/** Money in the shop's currency and locale ("£12.40", "12,40 €"). */
export function moneyWords(amount: number, currency: string, locale: string): string {
  return new Intl.NumberFormat(locale, { style: 'currency', currency }).format(amount);
}

/** The respiratory protection a level calls for, as a noun phrase. */
export const respiratorWords: Record<RespiratorLevel, string> = {
  'air-fed': 'air-fed protection',
  'vapour-and-particulate': 'a respirator with vapour and particulate filters',
  particulate: 'a particulate respirator',
};

/** How a job's material estimate is worked out, in a sentence for the page that shows it. */
export const estimateBasisWords =
  'One coat of each coat step over the coated area of every part, allowing for overspray, thinned with the least thinner the data sheet allows. Order a little over: real losses vary with part shape and the sprayer.';

/** Why a coat counts as outside its limits, in a few words (the conditions report's reason codes). */
export const outsideReasonWords: Record<'air-too-cold' | 'surface-too-cold' | 'rh-too-high' | 'dew-point-margin', string> = {
  'air-too-cold': 'air too cold',
  'surface-too-cold': 'surface too cold',
  'rh-too-high': 'humidity too high',
  'dew-point-margin': 'surface too close to the dew point',
};

/** A coat warning in a word or two, for a chip beside the coat; the full sentence stays with the coat. */
const warningShortWords: Record<string, string> = {
  'dew-point-margin': 'Dew point',
  'relative-humidity': 'Humidity',
  'air-temperature': 'Air cold',
  'surface-temperature': 'Surface cold',
  'below-min-application-temp': 'Cure temp',
  'film-thin': 'Thin dry film',
  'film-heavy': 'Heavy dry film',
  'outside-data-sheet-temps': 'Off sheet',
  'recoat-too-soon': 'Recoat too soon',
  'recoat-window-missed': 'Window missed',
  'thinning-outside-range': 'Thinning',
  'lot-expired': 'Lot expired',
  'pot-life-expired': 'Pot life over',
  'induction-not-over': 'Induction',
  'product-not-in-step': 'Other product',
};

export const warningShortWord = (code: string) => warningShortWords[code] ?? 'Warning';

/** "Coat 2 of 3"; a coat that matches no coat step, or whose job has no finish system, says so. */
export function coatPlaceWords(coat: { coatNumber: number | null; coatsTotal: number | null }): string {
  if (coat.coatsTotal === null) return 'Coat (no finish system)';
  if (coat.coatNumber === null) return 'Coat outside the finish system';
  return upperFirst(coatOfWords(coat.coatNumber, coat.coatsTotal));
}

/** Parts as people name them: "Door 1", "Door 1 and Door 2", "Door 1, Door 2 and 4 more". */
export function partLabelsWords(labels: readonly string[]): string {
  if (labels.length === 0) return partsWords(0);
  if (labels.length <= 2) return labels.join(' and ');
  return `${labels.slice(0, 2).join(', ')} and ${labels.length - 2} more`;
}

/** Column headers of the reports' CSV downloads, SI units named in each. */
export const csvHeaders = {
  boothUse: ['Week starting', 'Booth', 'Spray sessions', 'Hours booked', 'Hours sprayed'],
  areaSprayed: (groupBy: string) => ['Week starting', upperFirst(groupBy), 'Coats', 'Area (m²)'],
  conditions: ['Time', 'Row', 'Readings', 'Air (°C)', 'Relative humidity (%)', 'Surface above dew point (°C)', 'Product', 'Outside limits because'],
  solvent: ['Month', 'Litres mixed', 'VOC (kg)', 'VOC this year (kg)', 'Yearly threshold (kg)', 'Litres without a VOC figure'],
  material: ['Job', 'Customer', 'Product', 'Estimated (L)', 'Used (L)'],
  rework: ['Month', 'Kind', 'Reason', 'Coats'],
  upkeep: ['Booth', 'Record', 'Done', 'Due', 'Done by the due date'],
} as const;

/** A data sheet's thinning range in words: "5–10 %", "do not thin", or that it gives none (then thinning is not checked). */
export function thinningRangeWords(product: { thinnerMinPct: number; thinnerMaxPct: number; thinningRangeGiven: boolean }): string {
  if (!product.thinningRangeGiven) return 'no thinning range given';
  if (product.thinnerMaxPct === 0) return 'do not thin';
  if (product.thinnerMinPct === product.thinnerMaxPct) return `${product.thinnerMinPct} %`;
  return `${product.thinnerMinPct}–${product.thinnerMaxPct} %`;
}

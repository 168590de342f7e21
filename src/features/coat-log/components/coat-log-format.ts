import { TZDate } from '@date-fns/tz';
import type { Coat } from '../../../../shared/schemas/coat';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { formatQuantity } from '../../../../shared/units';
import { coatPlaceWords, partLabelsWords, shopMomentWords, type ShopFormat } from '../../../../shared/words';

/** The instant a shop day (YYYY-MM-DD) starts, on the shop's clock; `plusDays` 1 gives the end of that day. */
export function shopDayStart(date: string, timeZone: string, plusDays = 0): string | undefined {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(date);
  if (!match) return undefined;
  return new TZDate(Number(match[1]), Number(match[2]) - 1, Number(match[3]) + plusDays, timeZone).toISOString();
}

/** A coat log row as people name it: "Door 1 and Door 2, LJ-26-105, coat 1 of 3, Tue 3 Mar, 09:15". */
export function coatRowWords(coat: Coat, shop: ShopFormat): string {
  const job = coat.jobReference ?? 'no job';
  const which = coatPlaceWords(coat);
  return `${partLabelsWords(coat.partLabels)}, ${job}, ${which.charAt(0).toLowerCase()}${which.slice(1)}, ${shopMomentWords(new Date(coat.sprayedAt), shop)}`;
}

/** A replaced version names the version that corrects it (always the next one). */
export const correctedByWords = (coat: Coat) => `Corrected by v${coat.version + 1}`;

export function filmWords(coat: Coat, units: UnitSystem): string {
  const film = (um: number | null) => (um === null ? '—' : formatQuantity(um, 'filmThickness', units));
  return `${film(coat.wetFilmUm)} wet → ${film(coat.dryFilmUm)} dry`;
}

export function conditionWords(coat: Coat, units: UnitSystem): string {
  const temp = (c: number) => formatQuantity(c, 'temperature', units);
  return `Air ${temp(coat.airTempC)}, RH ${coat.relativeHumidityPct} %, surface ${temp(coat.surfaceTempC)}`;
}

export function warningWords(coat: Coat): string[] {
  return coat.warnings.map((w) => (w.acknowledgedReason ? `${w.message} Reason: ${w.acknowledgedReason}` : w.message));
}

/** One reason given for several stops (the coat form asks once): shown once rather than under each. */
export function sharedReason(coat: Coat): string | null {
  const reasons = [...new Set(coat.warnings.flatMap((w) => (w.acknowledgedReason ? [w.acknowledgedReason] : [])))];
  const acknowledged = coat.warnings.filter((w) => w.acknowledgedReason).length;
  return reasons.length === 1 && acknowledged > 1 ? reasons[0] : null;
}

export function versionWords(coat: Coat): string {
  return coat.replacesId === null ? `v${coat.version}` : `v${coat.version}, corrects v${coat.version - 1}`;
}

/** A coat as people name it: "the Kestrel Primer coat sprayed Tue 3 Mar, 09:15". */
export const coatNameWords = (coat: Pick<Coat, 'productName' | 'sprayedAt'>, shop: ShopFormat) => `the ${coat.productName} coat sprayed ${shopMomentWords(new Date(coat.sprayedAt), shop)}`;

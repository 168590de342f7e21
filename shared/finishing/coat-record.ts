import type { UnitSystem } from '../schemas/common';
import { coatTimes, type CoatInstants } from './coat-times';
import { assessConditions, type Verdict } from './conditions';
import type { DryingRow } from './drying-row-schema';
import { adjustDryingTimes, type DryingMethod } from './drying-times';
import { dryFilmUm, filmVerdict } from './film';
import { wallClockIn } from '../time';

export type CoatWarning = { code: string; message: string; verdict: Verdict };

export type CoatRecordInput = {
  product: {
    volumeSolidsPct: number;
    dryingTimes: DryingRow[];
    minApplicationTempC: number | null;
    maxRelativeHumidityPct: number | null;
    thinnerMinPct: number;
    thinnerMaxPct: number;
    /** False when the data sheet gives no thinning range: then thinning is not checked. */
    thinningRangeGiven: boolean;
    dryFilmPerCoatUm: number | null;
  };
  sprayedAt: Date;
  airTempC: number;
  relativeHumidityPct: number;
  surfaceTempC: number;
  /** Where the parts dry: a heated rack's temperature, else the booth air. */
  dryingTempC: number;
  thinningPct: number;
  wetFilmUm: number | null;
  /** The finish system's dry film target for this step, if known; else the data sheet's per-coat film. */
  targetDryFilmUm: number | null;
  lotExpired: boolean;
  /** The previous coat's recoat window on the parts, if they have one. */
  previousWindow: { opensAt: Date; closesAt: Date | null } | null;
  units?: UnitSystem;
  /** The shop's timezone, for times in messages. */
  timeZone?: string;
};

export type CoatRecord = CoatInstants & {
  dewPointC: number;
  dryFilmUm: number | null;
  dryingMethod: DryingMethod;
  warnings: CoatWarning[];
};


function filmWarnings(dry: number | null, target: number | null): CoatWarning[] {
  if (dry === null || target === null) return [];
  const verdict = filmVerdict(dry, target);
  if (verdict === 'on-target') return [];
  const words = verdict === 'thin' ? 'below' : 'above';
  return [{ code: `film-${verdict}`, verdict: 'caution', message: `Dry film ${dry.toFixed(0)} µm is well ${words} the ${target.toFixed(0)} µm target.` }];
}

function windowWarnings(sprayedAt: Date, window: CoatRecordInput['previousWindow'], timeZone: string): CoatWarning[] {
  if (!window) return [];
  if (sprayedAt < window.opensAt) {
    return [{ code: 'recoat-too-soon', verdict: 'stop', message: `The previous coat is not ready to recoat until ${wallClockIn(window.opensAt, timeZone).time}; coating now risks lifting or solvent entrapment.` }];
  }
  if (window.closesAt && sprayedAt > window.closesAt) {
    return [{ code: 'recoat-window-missed', verdict: 'stop', message: 'The previous coat’s recoat window had closed: the surface needed a denib (P320) for a mechanical key first.' }];
  }
  return [];
}

function materialWarnings(input: CoatRecordInput): CoatWarning[] {
  const warnings: CoatWarning[] = [];
  const { thinnerMinPct, thinnerMaxPct, thinningRangeGiven } = input.product;
  if (thinningRangeGiven && (input.thinningPct < thinnerMinPct || input.thinningPct > Math.max(thinnerMaxPct, thinnerMinPct))) {
    warnings.push({ code: 'thinning-outside-range', verdict: 'caution', message: `Thinning ${input.thinningPct} % is outside the data sheet’s ${thinnerMinPct}–${thinnerMaxPct} %.` });
  }
  if (input.lotExpired) warnings.push({ code: 'lot-expired', verdict: 'stop', message: 'The product lot is past its expiry date.' });
  return warnings;
}

/** Everything a coat record works out from its inputs: dew point, dry film, drying instants and warnings. */
export function computeCoatRecord(input: CoatRecordInput): CoatRecord {
  const { product } = input;
  const conditions = assessConditions({ ...input, minApplicationTempC: product.minApplicationTempC, maxRelativeHumidityPct: product.maxRelativeHumidityPct });
  const adjusted = adjustDryingTimes(product.dryingTimes, input.dryingTempC, { minApplicationTempC: product.minApplicationTempC, units: input.units });
  const dry = input.wetFilmUm === null ? null : dryFilmUm({ wetFilmUm: input.wetFilmUm, volumeSolidsPct: product.volumeSolidsPct, thinningPct: input.thinningPct });
  const warnings: CoatWarning[] = [
    ...conditions.checks.filter((c) => c.verdict !== 'go').map((c) => ({ code: c.code, message: c.message, verdict: c.verdict })),
    ...adjusted.warnings.map((w) => ({ ...w, verdict: 'caution' as Verdict })),
    ...filmWarnings(dry, input.targetDryFilmUm ?? product.dryFilmPerCoatUm),
    ...materialWarnings(input),
    ...windowWarnings(input.sprayedAt, input.previousWindow, input.timeZone ?? 'UTC'),
  ];
  return { ...coatTimes(input.sprayedAt, adjusted.times), dewPointC: conditions.dewPointC, dryFilmUm: dry, dryingMethod: adjusted.method, warnings };
}

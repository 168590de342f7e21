import type { CoatRecord, CoatWarning } from '../../../../shared/finishing/coat-record';
import type { Coat } from '../../../../shared/schemas/coat';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { useRacks } from '../../../api/racks/get-racks';
import { dryingTempOf, previewCoat, previousWindowOf } from '../utils/coat-preview';
import type { useCoatForm } from './use-coat-form';
import { useNow } from '../../../lib/use-now';

export interface CoatPreview {
  record: CoatRecord | null;
  warnings: CoatWarning[];
  problem: string | null;
}

interface UseCoatPreviewInput {
  coat: ReturnType<typeof useCoatForm>;
  sessionCoats: Coat[];
  units: UnitSystem;
  timeZone: string;
}

/** The coat record as the server will work it out, refreshed as the form changes and every 15 s (windows open and close). */
export function useCoatPreview({ coat, sessionCoats, units, timeZone }: UseCoatPreviewInput): CoatPreview {
  const now = useNow(15_000);
  const racks = useRacks({ page: 1, pageSize: 200 });
  const { values, product, step, chosen, work, productMixes } = coat;
  if (!product) return { record: null, warnings: [], problem: 'Choose the parts and the step to see the dry film, drying times and warnings.' };
  const { airTempC, relativeHumidityPct, surfaceTempC } = values;
  if (typeof airTempC !== 'number' || typeof relativeHumidityPct !== 'number' || typeof surfaceTempC !== 'number') {
    return { record: null, warnings: [], problem: 'Enter the air, humidity and surface readings to see the drying times and warnings.' };
  }
  const lot = product.lots.find((l) => l.id === values.lotId);
  const result = previewCoat({
    product,
    targetDryFilmUm: step?.dryFilmUm ?? null,
    airTempC,
    relativeHumidityPct,
    surfaceTempC,
    thinningPct: values.thinningPct ?? 0,
    wetFilmUm: values.wetFilmUm ?? null,
    dryingTempC: dryingTempOf(chosen, racks.data?.items ?? [], airTempC),
    lotExpired: lot?.expired ?? false,
    mix: productMixes.find((m) => m.id === values.mixId),
    previousWindow: previousWindowOf(chosen.map((p) => p.id), work.ready, sessionCoats),
    at: now,
    units,
    timeZone,
  });
  if ('problem' in result) return { record: null, warnings: [], problem: result.problem };
  return { record: result.record, warnings: result.warnings, problem: null };
}

import { computeCoatRecord, type CoatRecord, type CoatWarning } from '../../../../shared/finishing/coat-record';
import { coatDryingTempC } from '../../../../shared/finishing/drying-temperature';
import { potWarnings } from '../../../../shared/finishing/pot-life';
import type { Mix } from '../../../../shared/schemas/checklist';
import type { Coat } from '../../../../shared/schemas/coat';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Product } from '../../../../shared/schemas/product';
import type { Rack } from '../../../../shared/schemas/rack';
import type { ReadyPart } from '../../../../shared/schemas/ready';
import type { PickedPart } from './picked-part';

type Window = { opensAt: Date; closesAt: Date | null };

/**
 * The recoat window the parts are in: the latest one among this session's coats on them and
 * the ready list's next window. A part between coats with no window left has missed it; an
 * already-closed window stands for that so the same "missed" stop shows as the server gives.
 */
export function previousWindowOf(
  partIds: number[],
  ready: Map<number, ReadyPart>,
  sessionCoats: Coat[],
): Window | null {
  // A coat whose parts were all denibbed since is no longer what the next coat waits on: the denib re-opened the window.
  const denibbedSince = (coat: Coat) =>
    partIds.every((id) => !coat.partIds.includes(id) || (ready.get(id)?.denibbedAt ?? '') > coat.sprayedAt);
  const windows: Window[] = sessionCoats
    .filter((coat) => coat.partIds.some((id) => partIds.includes(id)) && !denibbedSince(coat))
    .map((coat) => ({
      opensAt: new Date(coat.recoatOpensAt),
      closesAt: coat.recoatClosesAt ? new Date(coat.recoatClosesAt) : null,
    }));
  for (const id of partIds) {
    const part = ready.get(id);
    if (part?.nextWindowOpensAt)
      windows.push({
        opensAt: new Date(part.nextWindowOpensAt),
        closesAt: part.nextWindowClosesAt ? new Date(part.nextWindowClosesAt) : null,
      });
    else if (part && part.state === 'in-finish' && part.coatsDone > 0)
      windows.push({ opensAt: new Date(0), closesAt: new Date(0) });
  }
  return windows.sort((a, b) => b.opensAt.getTime() - a.opensAt.getTime())[0] ?? null;
}

/** The server's rule (shared): the parts' racks' drying temperatures, else the booth air. */
export function dryingTempOf(parts: PickedPart[], racks: Rack[], airTempC: number): number {
  return coatDryingTempC(
    parts.map((part) => racks.find((rack) => rack.id === part.rackId)?.dryingTempC ?? null),
    airTempC,
  );
}

/**
 * The preview's clock ticks every few seconds, so it can read a moment before a pot that was just
 * mixed; a coat from the pot cannot go on before it was mixed, so that moment counts as the mixing.
 * The warnings themselves are the server's (shared).
 */
export function mixWarnings(mix: Mix | undefined, at: Date): CoatWarning[] {
  if (!mix) return [];
  return potWarnings(mix, new Date(Math.max(at.getTime(), Date.parse(mix.mixedAt))));
}

export interface CoatPreviewInput {
  product: Product;
  targetDryFilmUm: number | null;
  airTempC: number;
  relativeHumidityPct: number;
  surfaceTempC: number;
  thinningPct: number;
  wetFilmUm: number | null;
  dryingTempC: number;
  lotExpired: boolean;
  mix: Mix | undefined;
  previousWindow: Window | null;
  at: Date;
  units: UnitSystem;
  timeZone: string;
}

/** The record the server will make, worked out before sending, so every stop can be answered first. */
export function previewCoat(
  input: CoatPreviewInput,
): { record: CoatRecord; warnings: CoatWarning[] } | { problem: string } {
  try {
    const record = computeCoatRecord({ ...input, sprayedAt: input.at });
    return { record, warnings: [...record.warnings, ...mixWarnings(input.mix, input.at)] };
  } catch (error) {
    return { problem: error instanceof Error ? error.message : 'A value is out of range.' };
  }
}

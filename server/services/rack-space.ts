import { In, MoreThan } from 'typeorm';
import type { SiteData } from '../data/site-data';
import type { PartEntity } from '../db/entities/part.entity';
import { AppError } from '../lib/app-error';

/** Shelf area a part line takes lying flat, m². */
export const footprintM2 = (p: Pick<PartEntity, 'lengthMm' | 'widthMm' | 'quantity'>) => (p.lengthMm * p.widthMm * p.quantity) / 1e6;

/** Shelf space taken now by parts still drying towards handling, from the coats of the data's sites. */
export async function currentRackLoad(data: SiteData, now: Date) {
  const drying = await data.coats.find({ where: { handleAt: MoreThan(now.toISOString()) } });
  if (drying.length === 0) return [];
  const links = await data.coatParts.find({ where: { coatId: In(drying.map((c) => c.id)) } });
  const parts = await data.parts.findBy({ id: In([...new Set(links.map((l) => l.partId))]) });
  return drying.map((coat) => ({
    from: now,
    until: new Date(coat.handleAt),
    areaM2: links.filter((l) => l.coatId === coat.id).reduce((sum, l) => sum + footprintM2(parts.find((p) => p.id === l.partId)!), 0),
  }));
}

/** The shelf area of the data's racks, m². */
export async function rackCapacityM2(data: SiteData): Promise<number> {
  return (await data.racks.find()).reduce((sum, r) => sum + r.shelves * r.shelfAreaM2, 0);
}

/**
 * Booking parts whose coats will need more shelf than the site's racks have free (until the parts
 * now drying there can be handled) is refused with the figures, unless a lead gives a reason.
 * `site` is the booth's site: its racks and its drying coats.
 */
export async function assertRackSpace(site: SiteData, partIds: number[], now: Date, overrideReason: string | null): Promise<void> {
  if (partIds.length === 0 || overrideReason) return;
  const [parts, capacity, load] = await Promise.all([site.parts.findBy({ id: In(partIds) }), rackCapacityM2(site), currentRackLoad(site, now)]);
  const drying = load.reduce((sum, l) => sum + l.areaM2, 0);
  const needed = parts.reduce((sum, p) => sum + footprintM2(p), 0);
  if (needed + drying > capacity) {
    const message = `The parts need ${needed.toFixed(1)} m² of shelf but only ${Math.max(0, capacity - drying).toFixed(1)} m² of ${capacity.toFixed(1)} m² is free until parts now drying can be handled`;
    throw new AppError('rack_space', `${message}. A lead may book it anyway with a reason.`, { items: message, 'override.reason': 'Give a reason to book past the rack space' });
  }
}

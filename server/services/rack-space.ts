import { In, MoreThan, type EntityManager } from 'typeorm';
import { CoatPartEntity } from '../db/entities/coat-part.entity';
import { CoatEntity } from '../db/entities/coat.entity';
import { PartEntity } from '../db/entities/part.entity';
import { RackEntity } from '../db/entities/rack.entity';
import { AppError } from '../lib/app-error';

/** Shelf area a part line takes lying flat, m². */
export const footprintM2 = (p: PartEntity) => (p.lengthMm * p.widthMm * p.quantity) / 1e6;

/** Shelf space taken now by parts still drying towards handling. */
export async function currentRackLoad(manager: EntityManager, now: Date) {
  const drying = await manager.find(CoatEntity, { where: { handleAt: MoreThan(now.toISOString()) } });
  if (drying.length === 0) return [];
  const links = await manager.find(CoatPartEntity, { where: { coatId: In(drying.map((c) => c.id)) } });
  const parts = await manager.findBy(PartEntity, { id: In([...new Set(links.map((l) => l.partId))]) });
  return drying.map((coat) => ({
    from: now,
    until: new Date(coat.handleAt),
    areaM2: links.filter((l) => l.coatId === coat.id).reduce((sum, l) => sum + footprintM2(parts.find((p) => p.id === l.partId)!), 0),
  }));
}


/**
 * Booking parts whose coats will need more shelf than the racks have free (until the parts now
 * drying can be handled) is refused with the figures, unless a lead gives a reason.
 */
export async function assertRackSpace(manager: EntityManager, partIds: number[], now: Date, overrideReason: string | null): Promise<void> {
  if (partIds.length === 0 || overrideReason) return;
  const [parts, racks, load] = await Promise.all([manager.findBy(PartEntity, { id: In(partIds) }), manager.find(RackEntity), currentRackLoad(manager, now)]);
  const capacity = racks.reduce((sum, r) => sum + r.shelves * r.shelfAreaM2, 0);
  const drying = load.reduce((sum, l) => sum + l.areaM2, 0);
  const needed = parts.reduce((sum, p) => sum + footprintM2(p), 0);
  if (needed + drying > capacity) {
    const message = `The parts need ${needed.toFixed(1)} m² of shelf but only ${Math.max(0, capacity - drying).toFixed(1)} m² of ${capacity.toFixed(1)} m² is free until parts now drying can be handled`;
    throw new AppError('rack_space', `${message}. A lead may book it anyway with a reason.`, { items: message, 'override.reason': 'Give a reason to book past the rack space' });
  }
}

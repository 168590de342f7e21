import type { PartService } from '../services/parts';
import type { Actor } from '../services/audit';
import { footprintM2 } from '../services/rack-space';
import type { PartEntity } from './entities/part.entity';
import type { RackEntity } from './entities/rack.entity';

/** Where finished parts of the demo week go: this drying rack, shelf after shelf. */
export const finishedPartsRack = 'Rack B (drying room)';

/**
 * Puts the demo week's parts on the drying rack once their last coat is on, as the sprayer would:
 * laid flat, as many to a shelf as its area holds, shelf after shelf. Only after the last coat, so
 * no coat of the week dries at the rack's temperature instead of the booth's. A full rack leaves
 * the rest where they are.
 */
export function createRackShelver(rack: RackEntity | undefined, parts: PartService, partsOf: (ids: number[]) => Promise<PartEntity[]>) {
  let shelf = 1;
  let usedM2 = 0;
  return async (partIds: number[], actor: Actor): Promise<void> => {
    if (!rack) return;
    for (const part of await partsOf(partIds)) {
      if (part.rackId !== null) continue;
      const areaM2 = footprintM2(part);
      if (usedM2 > 0 && usedM2 + areaM2 > rack.shelfAreaM2) [shelf, usedM2] = [shelf + 1, 0];
      if (shelf > rack.shelves) return;
      await parts.update(part.id, { rackId: rack.id, shelf }, actor);
      usedM2 += areaM2;
    }
  };
}

import { coatedAreaM2 } from '../../shared/finishing/area';
import type { ShopRefs } from './base-shop';
import { isoInstant as iso } from './iso';
import { jobProgress, partsPerJob } from './shop-plan';
import { seededRandom, type Timeline } from './timeline';

export type Row = (string | number | null)[];

const customers = ['Hartfield Kitchen Co.', 'Morrow & Daughters', 'Penhallow Interiors', 'St Brannock School', 'Ardent Bathrooms', 'Quayside Studio', 'Fenwick Joinery', 'Orchard Lane Homes', 'Tallis Shopfitting', 'Greywell Hotel'];
// One part shape per bench system, in system order: doors, drawer sides, cupboard doors, panels.
const shapes = [
  { label: 'Door', kind: 'door', lengthMm: 715, widthMm: 496, thicknessMm: 18, faces: 'both' as const, edges: true },
  { label: 'Drawer side', kind: 'drawer-side', lengthMm: 500, widthMm: 140, thicknessMm: 15, faces: 'both' as const, edges: true },
  { label: 'Cupboard door', kind: 'door', lengthMm: 895, widthMm: 446, thicknessMm: 18, faces: 'both' as const, edges: true },
  { label: 'Panel', kind: 'panel', lengthMm: 1200, widthMm: 580, thicknessMm: 18, faces: 'one' as const, edges: true },
];
const tagAlphabet = 'ABCDEFGHJKMNPQRSTUVWXYZ23456789';

/** A rack tag made from the part id: unique, and in the alphabet the app prints. */
function tagFor(partId: number): string {
  let tag = '';
  for (let n = partId; tag.length < 7; n = Math.floor(n / tagAlphabet.length)) tag = tagAlphabet[n % tagAlphabet.length] + tag;
  return `B${tag}`;
}


/** The job row and its parts' rows for job number `jobSeq`. */
export function jobRows(jobSeq: number, timeline: Timeline, refs: ShopRefs): { job: Row; parts: Row[] } {
  const progress = jobProgress(jobSeq, timeline, refs);
  const random = seededRandom(jobSeq * 104729 + 3);
  const jobId = refs.nextId.jobs + jobSeq;
  const system = refs.systems[jobSeq % refs.systems.length];
  const start = timeline.days[progress.startDay];
  const createdMs = Math.min(start.midnightMs - 14 * 86_400_000 + 9 * 3_600_000, timeline.now.getTime());
  const dueMs = start.midnightMs + (progress.coats + 4) * 86_400_000;
  const collectedMs = timeline.days[progress.collectedDay] ? timeline.days[progress.collectedDay].midnightMs + 15 * 3_600_000 : null;
  const state = progress.collected ? 'delivered' : progress.coatsDone > 0 ? 'in-finish' : 'open';
  const customer = customers[Math.floor(random() * customers.length)];
  const job: Row = [jobId, customer, `BN-${String(jobSeq + 1).padStart(5, '0')}`, iso(dueMs).slice(0, 10), system.id, '', '', '', state, iso(createdMs), iso(progress.collected && collectedMs ? collectedMs : createdMs)];
  const shape = shapes[(jobSeq % refs.systems.length) % shapes.length];
  const rack = refs.racks[jobSeq % refs.racks.length];
  const partState = progress.collected ? 'collected' : progress.coatsDone === 0 ? 'waiting' : progress.coatsDone < progress.coats ? 'in-finish' : 'drying';
  const parts = Array.from({ length: partsPerJob }, (_, i): Row => {
    const partId = refs.nextId.parts + jobSeq * partsPerJob + i;
    const lengthMm = shape.lengthMm + Math.round(random() * 4) * 50;
    const geometry = { ...shape, lengthMm, quantity: 1 };
    return [partId, jobId, `${shape.label} ${i + 1}`, shape.kind, lengthMm, shape.widthMm, shape.thicknessMm, 1, shape.faces, shape.edges ? 1 : 0, coatedAreaM2(geometry), rack.id, (i % rack.shelves) + 1, tagFor(partId), partState, progress.collected ? iso(collectedMs!) : null, iso(createdMs), iso(createdMs)];
  });
  return { job, parts };
}

/** The ids of a job's parts, as jobRows numbers them. */
export const partIdsOf = (jobSeq: number, refs: ShopRefs) => Array.from({ length: partsPerJob }, (_, i) => refs.nextId.parts + jobSeq * partsPerJob + i);

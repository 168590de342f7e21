import type { CreateJobInput } from '../../shared/schemas/job';
import type { CreatePartInput } from '../../shared/schemas/part';

/** Finish systems by product name; the seed swaps names for ids. */
export const demoFinishSystems = [
  {
    name: 'Painted MDF, 2K PU satin',
    description: 'Isocyanate primer, denib, two satin topcoats. For kitchen and vanity doors.',
    steps: [
      { product: 'Kestrel 2K PU Primer White', dryFilmUm: 60 },
      { grit: 'P320' },
      { product: 'Kestrel 2K PU Topcoat Satin', dryFilmUm: 40 },
      { product: 'Kestrel 2K PU Topcoat Satin', dryFilmUm: 40 },
    ],
  },
  {
    name: 'Water-borne painted',
    description: 'Low-odour system for occupied buildings: primer, denib, two topcoats.',
    steps: [
      { product: 'Kestrel AquaPrime WB primer', dryFilmUm: 40 },
      { grit: 'P320' },
      { product: 'Kestrel AquaTop WB Topcoat Satin', dryFilmUm: 35 },
      { product: 'Kestrel AquaTop WB Topcoat Satin', dryFilmUm: 35 },
    ],
  },
  {
    name: 'Clear oak, precat matt',
    description: 'Sealer, denib, one precat clear coat. Drawer boxes and oak panels.',
    steps: [{ product: 'Kestrel Sanding Sealer NC', dryFilmUm: 25 }, { grit: 'P320' }, { product: 'Kestrel Precat Clear Matt', dryFilmUm: 30 }],
  },
] as const;

export interface DemoJob {
  job: Omit<CreateJobInput, 'dueDate' | 'finishSystemId'> & { dueInDays: number; finishSystem: string };
  parts: CreatePartInput[];
}

const door = (n: number, lengthMm: number, widthMm: number): CreatePartInput => ({ label: `Door ${n}`, kind: 'door', lengthMm, widthMm, thicknessMm: 18, quantity: 1, faces: 'both', edges: true });
const doorSizes: [number, number][] = [[715, 496], [715, 396], [715, 596], [895, 496], [570, 446], [1245, 596]];

function kitchenDoors(count: number): CreatePartInput[] {
  return Array.from({ length: count }, (_, i) => door(i + 1, ...doorSizes[i % doorSizes.length]));
}

/** A drawer box is four sides (front, back, two sides) plus a bottom panel. */
function drawerBoxes(count: number): CreatePartInput[] {
  return Array.from({ length: count }, (_, i) => {
    const box = `Drawer ${i + 1}`;
    const depth = i % 2 ? 500 : 450;
    return [
      { label: `${box} front`, kind: 'drawer-side', lengthMm: 520, widthMm: 140, thicknessMm: 15, quantity: 1, faces: 'both', edges: true },
      { label: `${box} back`, kind: 'drawer-side', lengthMm: 520, widthMm: 140, thicknessMm: 15, quantity: 1, faces: 'both', edges: true },
      { label: `${box} side L`, kind: 'drawer-side', lengthMm: depth, widthMm: 140, thicknessMm: 15, quantity: 1, faces: 'both', edges: true },
      { label: `${box} side R`, kind: 'drawer-side', lengthMm: depth, widthMm: 140, thicknessMm: 15, quantity: 1, faces: 'both', edges: true },
      { label: `${box} bottom`, kind: 'drawer-bottom', lengthMm: 505, widthMm: depth - 15, thicknessMm: 6, quantity: 1, faces: 'one', edges: false },
    ] satisfies CreatePartInput[];
  }).flat();
}

function panels(count: number, prefix: string, lengthMm: number, widthMm: number): CreatePartInput[] {
  return Array.from({ length: count }, (_, i) => ({ label: `${prefix} ${i + 1}`, kind: 'panel', lengthMm, widthMm, thicknessMm: 18, quantity: 1, faces: 'one', edges: true }));
}

export const demoJobs: DemoJob[] = [
  { job: { customer: 'Hartfield Kitchen Co.', reference: 'LJ-26-101', dueInDays: 9, finishSystem: 'Painted MDF, 2K PU satin', colour: 'Sage grey (customer sample 14)', sheen: 'Satin 30', notes: 'Shaker doors, 20 mm bead. Hinge holes drilled; mask nothing.' }, parts: kitchenDoors(42) },
  { job: { customer: 'Morrow & Daughters Cabinetmakers', reference: 'LJ-26-102', dueInDays: 6, finishSystem: 'Clear oak, precat matt', colour: 'Natural', sheen: 'Matt 10', notes: 'Dovetailed oak drawer boxes; bottoms one face only.' }, parts: drawerBoxes(16) },
  { job: { customer: 'Penhallow Interiors', reference: 'LJ-26-103', dueInDays: 14, finishSystem: 'Clear oak, precat matt', colour: 'Natural', sheen: 'Matt 10', notes: 'Wall panelling for a reading room. Backs are not seen.' }, parts: panels(18, 'Wall panel', 2100, 580) },
  { job: { customer: 'St Brannock School', reference: 'LJ-26-104', dueInDays: 20, finishSystem: 'Water-borne painted', colour: 'Chalk white', sheen: 'Satin 25', notes: 'Classroom cupboards. Water-borne only: the building is occupied.' }, parts: [...kitchenDoors(12), ...panels(6, 'Cupboard side', 900, 560)] },
  { job: { customer: 'Ardent Bathrooms', reference: 'LJ-26-105', dueInDays: 4, finishSystem: 'Painted MDF, 2K PU satin', colour: 'Ink blue', sheen: 'Satin 30', notes: 'Vanity doors; moisture-resistant MDF.' }, parts: kitchenDoors(8) },
  { job: { customer: 'Quayside Studio', reference: 'LJ-26-106', dueInDays: 28, finishSystem: 'Clear oak, precat matt', colour: 'Natural', sheen: 'Matt 10', notes: 'Shelving; cut list to follow.' }, parts: [] },
];

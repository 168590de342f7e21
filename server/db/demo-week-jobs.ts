import type { CreatePartInput } from '../../shared/schemas/part';

/** One booth line of the demo week: which booth, when on the shop's clock, and who sprays there. */
export interface WeekLane {
  booth: 'Booth 1 (cross-draft)' | 'Back spray room';
  from: [number, number];
  to: [number, number];
  sprayerEmail: string;
  /** The jobs this line works through, one coat a working day, in this order. */
  jobs: WeekJob[];
}

export interface WeekJob {
  customer: string;
  reference: string;
  finishSystem: string;
  dueInDays: number;
  colour: string;
  sheen: string;
  notes: string;
  parts: CreatePartInput[];
}

function parts(prefix: string, kind: string, count: number, lengthMm: number, widthMm: number, faces: CreatePartInput['faces'] = 'both'): CreatePartInput[] {
  return Array.from({ length: count }, (_, i) => ({ label: `${prefix} ${i + 1}`, kind, lengthMm, widthMm, thicknessMm: 18, quantity: 1, faces, edges: true }));
}

/**
 * The shop's usual day: Mina in booth 1 before and after lunch, Dev (the lead) on water-borne work
 * in the back room late morning, so nobody is in two booths at once. Times sit inside the demo
 * booths' opening hours (07:00–17:00, Monday to Friday).
 */
export const weekLanes: WeekLane[] = [
  {
    booth: 'Booth 1 (cross-draft)', from: [8, 0], to: [10, 30], sprayerEmail: 'sprayer@larchmere.test',
    jobs: [
      { customer: 'Calloway Bar & Kitchen', reference: 'LJ-26-107', finishSystem: 'Painted MDF, 2K PU satin', dueInDays: 8, colour: 'Deep green (RAL 6009)', sheen: 'Satin 30', notes: 'Back-bar doors; handles fitted on site.', parts: parts('Door', 'door', 12, 715, 446) },
      { customer: 'Whitlow Garden Rooms', reference: 'LJ-26-110', finishSystem: 'Painted MDF, 2K PU satin', dueInDays: 12, colour: 'Stone (customer sample 3)', sheen: 'Satin 30', notes: 'Window boards and shutters.', parts: parts('Shutter', 'panel', 6, 1200, 300) },
    ],
  },
  {
    booth: 'Back spray room', from: [10, 0], to: [12, 30], sprayerEmail: 'lead@larchmere.test',
    jobs: [
      { customer: 'Brackenhurst Surgery', reference: 'LJ-26-108', finishSystem: 'Water-borne painted', dueInDays: 10, colour: 'Chalk white', sheen: 'Satin 25', notes: 'Consulting-room cupboards; water-borne only, the surgery stays open.', parts: parts('Cupboard door', 'door', 10, 895, 446) },
      { customer: 'Ockley Parish Hall', reference: 'LJ-26-111', finishSystem: 'Water-borne painted', dueInDays: 15, colour: 'Pale grey', sheen: 'Satin 25', notes: 'Stage-front panels.', parts: parts('Stage panel', 'panel', 6, 1800, 600, 'one') },
    ],
  },
  {
    booth: 'Booth 1 (cross-draft)', from: [13, 0], to: [15, 30], sprayerEmail: 'sprayer@larchmere.test',
    jobs: [
      { customer: 'Selwood Oak Studio', reference: 'LJ-26-109', finishSystem: 'Clear oak, precat matt', dueInDays: 7, colour: 'Natural', sheen: 'Matt 10', notes: 'Oak shelving for a gallery shop.', parts: parts('Shelf', 'panel', 14, 900, 280) },
      { customer: 'Garrow & Finch Opticians', reference: 'LJ-26-112', finishSystem: 'Clear oak, precat matt', dueInDays: 11, colour: 'Natural', sheen: 'Matt 10', notes: 'Display drawer fronts.', parts: parts('Drawer front', 'drawer-front', 10, 520, 180) },
    ],
  },
];

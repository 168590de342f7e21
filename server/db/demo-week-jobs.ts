import type { CreatePartInput } from '../../shared/schemas/part';

/** One booth line of the demo week: which booth, when on the shop's clock, and who sprays there. */
export interface WeekLane {
  booth: 'Booth 1 (cross-draft)' | 'Back spray room';
  from: [number, number];
  to: [number, number];
  sprayerEmail: string;
  /** The jobs this line works through, one coat a working day, in this order. */
  jobs: WeekJob[];
  /** The jobs it worked through on this week's earlier working days, one coat a day. */
  earlier: WeekJob[];
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
    earlier: [
      { customer: 'Pennard Lodge Hotel', reference: 'LJ-26-113', finishSystem: 'Painted MDF, 2K PU satin', dueInDays: 2, colour: 'Heritage blue', sheen: 'Satin 30', notes: 'Wardrobe doors for the east wing.', parts: parts('Wardrobe door', 'door', 8, 1960, 446) },
      { customer: 'Marlow Cross Bakery', reference: 'LJ-26-116', finishSystem: 'Painted MDF, 2K PU satin', dueInDays: 5, colour: 'Cream (RAL 9001)', sheen: 'Satin 30', notes: 'Counter front panels.', parts: parts('Counter panel', 'panel', 5, 1100, 600) },
    ],
  },
  {
    booth: 'Back spray room', from: [10, 0], to: [12, 30], sprayerEmail: 'lead@larchmere.test',
    jobs: [
      { customer: 'Brackenhurst Surgery', reference: 'LJ-26-108', finishSystem: 'Water-borne painted', dueInDays: 10, colour: 'Chalk white', sheen: 'Satin 25', notes: 'Consulting-room cupboards; water-borne only, the surgery stays open.', parts: parts('Cupboard door', 'door', 10, 895, 446) },
      { customer: 'Ockley Parish Hall', reference: 'LJ-26-111', finishSystem: 'Water-borne painted', dueInDays: 15, colour: 'Pale grey', sheen: 'Satin 25', notes: 'Stage-front panels.', parts: parts('Stage panel', 'panel', 6, 1800, 600, 'one') },
    ],
    earlier: [
      { customer: 'Thornbury Nursery', reference: 'LJ-26-114', finishSystem: 'Water-borne painted', dueInDays: 3, colour: 'Soft yellow', sheen: 'Satin 25', notes: 'Low cupboard doors; water-borne only, the nursery stays open.', parts: parts('Low door', 'door', 10, 600, 400) },
      { customer: 'Hale & Crisp Solicitors', reference: 'LJ-26-117', finishSystem: 'Water-borne painted', dueInDays: 6, colour: 'Off white', sheen: 'Satin 25', notes: 'Meeting-room sideboard doors.', parts: parts('Sideboard door', 'door', 6, 720, 450) },
    ],
  },
  {
    booth: 'Booth 1 (cross-draft)', from: [13, 0], to: [15, 30], sprayerEmail: 'sprayer@larchmere.test',
    jobs: [
      { customer: 'Selwood Oak Studio', reference: 'LJ-26-109', finishSystem: 'Clear oak, precat matt', dueInDays: 7, colour: 'Natural', sheen: 'Matt 10', notes: 'Oak shelving for a gallery shop.', parts: parts('Shelf', 'panel', 14, 900, 280) },
      { customer: 'Garrow & Finch Opticians', reference: 'LJ-26-112', finishSystem: 'Clear oak, precat matt', dueInDays: 11, colour: 'Natural', sheen: 'Matt 10', notes: 'Display drawer fronts.', parts: parts('Drawer front', 'drawer-front', 10, 520, 180) },
    ],
    earlier: [
      { customer: 'Lowther Wine Rooms', reference: 'LJ-26-115', finishSystem: 'Clear oak, precat matt', dueInDays: 2, colour: 'Natural', sheen: 'Matt 10', notes: 'Bottle-rack shelves.', parts: parts('Rack shelf', 'panel', 12, 800, 250) },
      { customer: 'Beckett Row Gallery', reference: 'LJ-26-118', finishSystem: 'Clear oak, precat matt', dueInDays: 7, colour: 'Natural', sheen: 'Matt 10', notes: 'Plinth tops.', parts: parts('Plinth top', 'panel', 4, 600, 600) },
      { customer: 'Ferris Quay Chandlery', reference: 'LJ-26-119', finishSystem: 'Clear oak, precat matt', dueInDays: 9, colour: 'Natural', sheen: 'Matt 10', notes: 'Display counter trims.', parts: parts('Counter trim', 'trim', 8, 1500, 60) },
    ],
  },
];

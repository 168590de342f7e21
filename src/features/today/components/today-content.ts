import type { Permission, Role } from '../../../../shared/permissions';

export interface ReadyCard {
  to: string;
  title: string;
  text: string;
  permission?: Permission;
  count?: 'booths' | 'racks';
}

export const roleIntro: Record<Role, string> = {
  admin: 'Run the shop: people, booths, racks and settings.',
  lead: 'Set up the booths and racks the plan will run on.',
  sprayer: 'Look up the booths and racks, and work out the numbers before you spray.',
  assembler: 'See which parts you can pick up and when the rest will be ready, and mark them collected.',
};

export const readyCards: ReadyCard[] = [
  { to: '/planner', title: 'Booth planner', text: 'A week and day calendar of spray sessions per booth: book, move and check the safety cautions.', permission: 'spray-sessions:read' },
  { to: '/spray-sessions', title: 'Spray sessions', text: 'Your sessions today and this week: pre-spray checks, cautions, mixes with pot-life countdowns, coat entry and the clearance countdown.', permission: 'spray-sessions:read' },
  { to: '/coat-log', title: 'Coat log', text: 'Every coat with its film, conditions, warnings and who sprayed it; corrections and CSV export.', permission: 'coats:read' },
  { to: '/reports', title: 'Reports', text: 'Booth use, area sprayed, conditions against limits, solvent and VOC, material against estimate and rework, with CSV and print.', permission: 'reports:read' },
  { to: '/ready', title: 'Ready board', text: 'Parts by job or rack, with live countdowns to handle, pack and full cure; mark parts collected.', permission: 'ready:read' },
  { to: '/jobs', title: 'Jobs and parts', text: 'Jobs and their parts, cut-list import, printable rack tags and material estimates.', permission: 'jobs:read' },
  { to: '/booths', title: 'Booths', text: 'Clearance times, face velocity, spray rate and opening hours.', permission: 'booths:read', count: 'booths' },
  { to: '/racks', title: 'Racks', text: 'Shelves, drying space and which racks are heated.', permission: 'racks:read', count: 'racks' },
  { to: '/data-sheets', title: 'Data sheets', text: 'Products with their drying times at any temperature, lots in stock and the TDS and SDS PDFs.', permission: 'products:read' },
  { to: '/finish-systems', title: 'Finish systems', text: 'The coats and denibs a part goes through, with litres per m² and the shortest time through.', permission: 'finish-systems:read' },
  { to: '/calculator', title: 'Calculator', text: 'Conditions, film, mix and clearance sums, worked out in your units.', permission: 'calculator:use' },
  { to: '/settings/users', title: 'Users', text: 'Add people, set their role, reset a password, disable a sign-in.', permission: 'users:write' },
  { to: '/activity', title: 'Activity log', text: 'Who changed what, and when.', permission: 'audit:read' },
  { to: '/settings/shop', title: 'Shop settings', text: 'Shop name, timezone and planning defaults.', permission: 'settings:write' },
  { to: '/settings/preferences', title: 'My preferences', text: 'Your name and whether you see metric or US units.' },
];

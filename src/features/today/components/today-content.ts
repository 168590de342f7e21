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
  assembler: 'Look up the racks and booths. The ready board you will use most is still to come.',
};

export const readyCards: ReadyCard[] = [
  { to: '/booths', title: 'Booths', text: 'Clearance times, face velocity, spray rate and opening hours.', permission: 'booths:read', count: 'booths' },
  { to: '/racks', title: 'Racks', text: 'Shelves, drying space and which racks are heated.', permission: 'racks:read', count: 'racks' },
  { to: '/calculator', title: 'Calculator', text: 'Conditions, film, mix and clearance sums, worked out in your units.', permission: 'calculator:use' },
  { to: '/settings/users', title: 'Users', text: 'Add people, set their role, reset a password, disable a sign-in.', permission: 'users:write' },
  { to: '/activity', title: 'Activity log', text: 'Who changed what, and when.', permission: 'audit:read' },
  { to: '/settings/shop', title: 'Shop settings', text: 'Shop name, timezone and planning defaults.', permission: 'settings:write' },
  { to: '/settings/preferences', title: 'My preferences', text: 'Your name and whether you see metric or US units.' },
];

interface NotYet {
  title: string;
  text: string;
  roles: readonly Role[];
}

export const notBuiltYet: NotYet[] = [
  { title: 'Booth planner', text: 'A week and day calendar of spray sessions per booth.', roles: ['admin', 'lead', 'sprayer'] },
  { title: 'Spray sessions', text: 'Pre-spray checklist, safety cautions, mixes with pot-life countdowns, coat entry.', roles: ['admin', 'lead', 'sprayer'] },
  { title: 'Coat log', text: 'The record of every coat, with conditions and who sprayed it.', roles: ['admin', 'lead', 'sprayer'] },
  { title: 'Ready board', text: 'Parts by job, with countdowns to handle, pack and full cure.', roles: ['admin', 'lead', 'sprayer', 'assembler'] },
  { title: 'Jobs and parts', text: 'Jobs, cut-list import and rack tags.', roles: ['admin', 'lead', 'assembler'] },
  { title: 'Data sheets', text: 'Products, drying times, lots and safety sheets.', roles: ['admin', 'lead', 'sprayer'] },
  { title: 'Reports', text: 'Booth use, area sprayed, conditions and solvent used.', roles: ['admin', 'lead'] },
];

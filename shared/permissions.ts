export const roles = ['admin', 'lead', 'sprayer', 'assembler'] as const;
export type Role = (typeof roles)[number];

export const roleLabels: Record<Role, string> = {
  admin: 'Owner / admin',
  lead: 'Finishing lead',
  sprayer: 'Sprayer',
  assembler: 'Assembler',
};

export const permissions = [
  'booths:read',
  'booths:write',
  'racks:read',
  'racks:write',
  'users:read',
  'users:write',
  'settings:read',
  'settings:write',
  'calculator:use',
  'audit:read',
  'products:read',
  'products:write',
  'finish-systems:read',
  'finish-systems:write',
  'jobs:read',
  'jobs:write',
  'spray-sessions:read',
  'spray-sessions:write',
  'spray-sessions:run',
  'coats:read',
  'coats:write',
  'ready:read',
  'parts:collect',
  'readings:write',
  'reports:read',
  'sites:read',
  'sites:write',
  'today:read',
  'upkeep:read',
  'upkeep:log',
  'upkeep:write',
  'crew:own',
  'crew:status',
  'crew:write',
] as const;
export type Permission = (typeof permissions)[number];

// Crew protection records are health and personal records: only the admin records them and reads
// everyone's details; a lead sees each person's status (valid, due soon, lapsed) and nothing more.
const adminOnly: readonly Permission[] = ['users:read', 'users:write', 'settings:write', 'sites:write', 'crew:write'];

/** The one matrix: the server enforces it, the client hides what a role may not do. Deny by default. */
const matrix: Record<Role, readonly Permission[]> = {
  admin: permissions,
  // A lead does everything but run the users and the shop's own settings.
  lead: permissions.filter((p) => !adminOnly.includes(p)),
  sprayer: [
    'today:read',
    'sites:read',
    'booths:read',
    'racks:read',
    'settings:read',
    'calculator:use',
    'products:read',
    'finish-systems:read',
    'jobs:read',
    'spray-sessions:read',
    'spray-sessions:run',
    'coats:read',
    'coats:write',
    'ready:read',
    'readings:write',
    // Booth upkeep as a shop runs it: the sprayer reads the booth's record, notes the filter gauge and
    // logs the filters they change; banks, extraction tests and fire inspections are the lead's.
    'upkeep:read',
    'upkeep:log',
    // Their own fit tests, health surveillance and training.
    'crew:own',
  ],
  assembler: ['sites:read', 'booths:read', 'racks:read', 'settings:read', 'finish-systems:read', 'jobs:read', 'spray-sessions:read', 'ready:read', 'parts:collect'],
};

export function can(role: Role | null | undefined, permission: Permission): boolean {
  if (!role) return false;
  return matrix[role]?.includes(permission) ?? false;
}

export function permissionsOf(role: Role): readonly Permission[] {
  return matrix[role];
}

/** An admin works across every site; everyone else sees and plans their own site only. */
export function seesAllSites(role: Role | null | undefined): boolean {
  return role === 'admin';
}

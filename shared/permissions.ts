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
] as const;
export type Permission = (typeof permissions)[number];

const adminOnly: readonly Permission[] = ['users:read', 'users:write', 'settings:write', 'sites:write'];

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

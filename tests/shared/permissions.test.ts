import { describe, expect, it } from 'vitest';
import { can, permissions, roles } from '../../shared/permissions';

// The matrix of DESIGN.md §2, written out row by row so a change to shared/permissions.ts must be deliberate.
const expected: Record<string, string[]> = {
  admin: [...permissions],
  lead: [
    ...['booths:read', 'booths:write', 'racks:read', 'racks:write', 'settings:read', 'calculator:use', 'audit:read'],
    ...['products:read', 'products:write', 'finish-systems:read', 'finish-systems:write', 'jobs:read', 'jobs:write'],
    ...['spray-sessions:read', 'spray-sessions:write', 'spray-sessions:run', 'coats:read', 'coats:write', 'ready:read', 'parts:collect', 'readings:write'],
    // All reports; their own site's sites list, but adding or renaming sites is the admin's.
    ...['reports:read', 'sites:read'],
    // The day's planning board.
    'today:read',
    // Booth upkeep in full; their own crew records, and everyone's status only (recording them is the admin's).
    ...['upkeep:read', 'upkeep:log', 'upkeep:write', 'crew:own', 'crew:status'],
  ],
  // Sprayers read data sheets, finish systems and jobs but edit none of them.
  sprayer: [
    ...['booths:read', 'racks:read', 'settings:read', 'calculator:use', 'products:read', 'finish-systems:read', 'jobs:read'],
    // Sprayers run the sessions they are given and log coats, but do not book the booth.
    ...['spray-sessions:read', 'spray-sessions:run', 'coats:read', 'coats:write', 'ready:read', 'readings:write', 'sites:read'],
    // Their own day: the sessions they are given and the next step in each.
    'today:read',
    // They note the filter gauge and log a filter change, and read their own crew records.
    ...['upkeep:read', 'upkeep:log', 'crew:own'],
  ],
  // Assemblers land on the ready board rather than a day board; they read jobs (and the systems they name) to know what is coming.
  assembler: ['sites:read', 'booths:read', 'racks:read', 'settings:read', 'finish-systems:read', 'jobs:read', 'spray-sessions:read', 'ready:read', 'parts:collect'],
};

describe('the permission matrix', () => {
  it.each(roles)('grants %s exactly its row and denies everything else', (role) => {
    for (const permission of permissions) {
      expect(can(role, permission), `${role} → ${permission}`).toBe(expected[role].includes(permission));
    }
  });

  it('denies everything to nobody and to an unknown role', () => {
    expect(can(null, 'booths:read')).toBe(false);
    expect(can(undefined, 'booths:read')).toBe(false);
    expect(can('visitor' as never, 'booths:read')).toBe(false);
  });

  it('keeps users and shop settings to the admin', () => {
    expect(roles.filter((role) => can(role, 'users:write'))).toEqual(['admin']);
    expect(roles.filter((role) => can(role, 'settings:write'))).toEqual(['admin']);
    expect(roles.filter((role) => can(role, 'sites:write'))).toEqual(['admin']);
  });

  it('keeps the recording of crew protection records to the admin, and their status to the admin and the lead', () => {
    expect(roles.filter((role) => can(role, 'crew:write'))).toEqual(['admin']);
    expect(roles.filter((role) => can(role, 'crew:status'))).toEqual(['admin', 'lead']);
  });

  it('shows reports to the owner and the finishing lead only', () => {
    expect(roles.filter((role) => can(role, 'reports:read'))).toEqual(['admin', 'lead']);
  });
});

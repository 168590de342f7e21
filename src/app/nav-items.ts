import { can, type Permission, type Role } from '../../shared/permissions';

interface NavItem {
  to: string;
  label: string;
  permission?: Permission;
  end?: boolean;
}

interface NavGroup {
  label: string;
  items: NavItem[];
}

const groups: NavGroup[] = [
  {
    label: 'Workshop',
    items: [
      { to: '/', label: 'Today', end: true, permission: 'today:read' },
      { to: '/planner', label: 'Booth planner', permission: 'spray-sessions:read' },
      { to: '/spray-sessions', label: 'Spray sessions', permission: 'spray-sessions:read' },
      { to: '/coat-log', label: 'Coat log', permission: 'coats:read' },
      { to: '/reports', label: 'Reports', permission: 'reports:read' },
      { to: '/ready', label: 'Ready board', permission: 'ready:read' },
      { to: '/jobs', label: 'Jobs', permission: 'jobs:read' },
      { to: '/booths', label: 'Booths', permission: 'booths:read' },
      { to: '/racks', label: 'Racks', permission: 'racks:read' },
      { to: '/upkeep', label: 'Booth upkeep', permission: 'upkeep:read' },
      { to: '/crew', label: 'Crew records', permission: 'crew:own' },
      { to: '/data-sheets', label: 'Data sheets', permission: 'products:read' },
      { to: '/finish-systems', label: 'Finish systems', permission: 'finish-systems:read' },
      { to: '/calculator', label: 'Calculator', permission: 'calculator:use' },
      { to: '/activity', label: 'Activity log', permission: 'audit:read' },
    ],
  },
  {
    label: 'Settings',
    items: [
      { to: '/settings/preferences', label: 'My preferences' },
      { to: '/settings/shop', label: 'Shop', permission: 'settings:read' },
      { to: '/settings/users', label: 'Users', permission: 'users:read' },
      { to: '/settings/sites', label: 'Sites', permission: 'sites:write' },
      { to: '/settings/mailbox', label: 'Mailbox', permission: 'users:read' },
    ],
  },
];

/** The navigation a role may use; items it may not use are left out, not greyed. */
export function navFor(role: Role): NavGroup[] {
  return groups
    .map((group) => ({ ...group, items: group.items.filter((item) => !item.permission || can(role, item.permission)) }))
    .filter((group) => group.items.length > 0);
}

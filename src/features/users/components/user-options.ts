import { roleLabels, roles } from '../../../../shared/permissions';

export const roleOptions = roles.map((role) => ({ value: role, label: roleLabels[role] }));
/** The sites a user may be put on, for an admin of several; left out, a new user joins the admin's own site. */
export interface UserSiteChoice {
  options: ReadonlyArray<{ value: number; label: string }>;
  defaultSiteId: number;
}

export const unitOptions = [
  { value: 'metric', label: 'Metric' },
  { value: 'us', label: 'US customary' },
];

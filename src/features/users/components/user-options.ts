import { roleLabels, roles } from '../../../../shared/permissions';

export const roleOptions = roles.map((role) => ({ value: role, label: roleLabels[role] }));
export const unitOptions = [
  { value: 'metric', label: 'Metric' },
  { value: 'us', label: 'US customary' },
];

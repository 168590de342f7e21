import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { updateShopSettingsSchema } from '../../../../shared/schemas/settings';
import { apiClient } from '../../../lib/api-client';
import { settingsResponseSchema } from './get-settings';
import { settingsKeys } from './settings-keys';

export type UpdateShopSettingsInput = z.input<typeof updateShopSettingsSchema>;

export async function updateShopSettings(changes: UpdateShopSettingsInput) {
  const { settings } = await apiClient.patch('/api/settings', changes, settingsResponseSchema);
  return settings;
}

export function useUpdateShopSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateShopSettings,
    onSuccess: (settings) => queryClient.setQueryData(settingsKeys.shop(), settings),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { shopSettingsResponseSchema, type updateShopSettingsSchema } from '../../../shared/schemas/settings';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';
import { settingsKeys } from './settings-keys';

export type UpdateShopSettingsInput = z.input<typeof updateShopSettingsSchema>;

export async function updateShopSettings(changes: UpdateShopSettingsInput) {
  const { settings } = await apiClient.patch('/api/settings', changes, shopSettingsResponseSchema);
  return settings;
}

/** The timezone and planning temperature go into every time the server works out. */
export function useUpdateShopSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateShopSettings,
    onSuccess: (settings) => {
      queryClient.setQueryData(settingsKeys.shop(), settings);
      return invalidate(queryClient, changedKeys.settings());
    },
  });
}

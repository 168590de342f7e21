import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { shopSettingsSchema } from '../../../../shared/schemas/settings';
import { apiClient } from '../../../lib/api-client';
import { settingsKeys } from './settings-keys';

export const settingsResponseSchema = z.object({ settings: shopSettingsSchema });

export async function getShopSettings(signal?: AbortSignal) {
  const { settings } = await apiClient.get('/api/settings', settingsResponseSchema, { signal });
  return settings;
}

export const shopSettingsQueryOptions = () =>
  queryOptions({
    queryKey: settingsKeys.shop(),
    queryFn: ({ signal }) => getShopSettings(signal),
    staleTime: 10 * 60_000,
  });

export function useShopSettings() {
  return useQuery(shopSettingsQueryOptions());
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { shopSettingsResponseSchema } from '../../../shared/schemas/settings';
import { apiClient } from '../../lib/api-client';
import { settingsKeys } from './settings-keys';

export async function getShopSettings(signal?: AbortSignal) {
  const { settings } = await apiClient.get('/api/settings', shopSettingsResponseSchema, { signal });
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

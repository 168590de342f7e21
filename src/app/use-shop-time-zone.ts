import { useShopSettings } from '../api/settings/get-settings';

/**
 * The shop's timezone for showing times; null while the settings load. If they cannot be read,
 * the device's zone stands in: the screens using this hang in the shop itself.
 */
export function useShopTimeZone(): string | null {
  const settings = useShopSettings();
  if (settings.isPending) return null;
  return settings.data?.timezone ?? Intl.DateTimeFormat().resolvedOptions().timeZone;
}

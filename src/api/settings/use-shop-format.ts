import type { ShopFormat } from '../../../shared/words';
import { useShopSettings } from './get-settings';

/**
 * How the shop writes dates, times, numbers and money (its zone and locale), for the shared words
 * in shared/words.ts. The device's zone and locale stand in while the settings load or if they
 * cannot be read: the screens hang in the shop itself.
 */
export function useShopFormat(): ShopFormat {
  const settings = useShopSettings();
  const device = Intl.DateTimeFormat().resolvedOptions();
  return { timeZone: settings.data?.timezone ?? device.timeZone, locale: settings.data?.locale ?? device.locale };
}

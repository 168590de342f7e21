import { calendarDateIn } from '../../shared/time';
import { useShopSettings } from '../api/settings/get-settings';

/** Today's date where the shop is (due dates are the shop's days, not the device's). */
export function useShopToday(): string {
  const settings = useShopSettings();
  const timeZone = settings.data?.timezone ?? Intl.DateTimeFormat().resolvedOptions().timeZone;
  return calendarDateIn(new Date(), timeZone);
}

import { useMe } from '../api/auth/get-me';
import { everyLiveKey, keysForChange } from '../api/live-changes';
import { useLiveUpdates, type LiveChange } from '../lib/use-live-updates';

const keysFor = (change: LiveChange) => keysForChange(change.type);

/** Mounted once for the whole app: every open board, calendar and log follows the server's changes. */
export function LiveUpdates() {
  const me = useMe();
  useLiveUpdates(me.data?.id ?? null, { keysFor, allKeys: everyLiveKey });
  return null;
}

import type { QueryKey } from '@tanstack/react-query';
import { useMe } from '../features/auth/api/get-me';
import { jobKeys } from '../features/jobs/api/job-keys';
import { partKeys } from '../features/parts/api/part-keys';
import { plannerKeys } from '../features/planner/api/planner-keys';
import { rackKeys } from '../features/racks/api/rack-keys';
import { readyKeys } from '../features/ready-board/api/ready-keys';
import { spraySessionKeys } from '../features/spray-session/api/spray-session-keys';
import { todayKeys } from '../features/today/api/today-keys';
import { useLiveUpdates, type LiveChange } from '../lib/use-live-updates';

// Prefixes, broad on purpose: each feature keeps its own keys, and only queries on screen refetch.
// 'coats' and 'spray-sessions' are the roots the coat log and session lists use; none yet is harmless.
const coatLog: QueryKey = ['coats'];
const sessionLists: QueryKey = ['spray-sessions'];
const readings: QueryKey = ['readings'];

const keysByChange: Record<string, readonly QueryKey[]> = {
  'coat.created': [readyKeys.lists(), jobKeys.all, partKeys.all, plannerKeys.all, spraySessionKeys.all, coatLog, todayKeys.all],
  'denib.created': [readyKeys.lists(), jobKeys.all, partKeys.all, plannerKeys.all, spraySessionKeys.all, coatLog, todayKeys.all],
  'spray-session.changed': [plannerKeys.all, spraySessionKeys.all, sessionLists, todayKeys.all],
  'part.changed': [readyKeys.lists(), jobKeys.all, partKeys.all, plannerKeys.all, spraySessionKeys.all, rackKeys.all, todayKeys.all],
  'reading.created': [spraySessionKeys.all, readings, todayKeys.all],
};

const allKeys: readonly QueryKey[] = [...new Map(Object.values(keysByChange).flat().map((key) => [JSON.stringify(key), key])).values()];

// An event type this client does not know yet refreshes everything live rather than nothing.
const keysFor = (change: LiveChange) => keysByChange[change.type] ?? allKeys;

/** Mounted once for the whole app: every open board, calendar and log follows the server's changes. */
export function LiveUpdates() {
  const me = useMe();
  useLiveUpdates(me.data?.id ?? null, { keysFor, allKeys });
  return null;
}

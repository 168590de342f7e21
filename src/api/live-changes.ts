import type { QueryKey } from '@tanstack/react-query';
import type { ChangeEventType } from '../../shared/schemas/change-event';
import { changedKeys } from './changes';

/**
 * What each change the server streams refreshes: the same keys the change's own mutation
 * invalidates, so a coat logged on a tablet reaches an open coat log, ready board, planner,
 * Today and job page as it would on the tablet itself.
 */
export const liveChangeKeys: Record<ChangeEventType, () => QueryKey[]> = {
  'coat.created': changedKeys.coat,
  'denib.created': changedKeys.denib,
  'spray-session.changed': changedKeys.spraySession,
  'part.changed': changedKeys.part,
  'reading.created': changedKeys.reading,
  'product.changed': changedKeys.product,
  'finish-system.changed': changedKeys.finishSystem,
};

const unique = (keys: QueryKey[]) => [...new Map(keys.map((key) => [JSON.stringify(key), key])).values()];

/** Everything the live views show: polled while the stream is down, and refreshed after a gap in which changes may have been missed. */
export const everyLiveKey: readonly QueryKey[] = unique(Object.values(liveChangeKeys).flatMap((keys) => keys()));

/** The keys a change refreshes; a type this client does not know yet refreshes everything live rather than nothing. */
export function keysForChange(type: string): readonly QueryKey[] {
  return type in liveChangeKeys ? liveChangeKeys[type as ChangeEventType]() : everyLiveKey;
}

import type { LiveStreamLimits } from '../lib/live-stream-limits';
import { inScope, type SiteScope } from '../lib/site-scope';
import { isInternalChange, type ChangeEvent, type EventBus } from './events';

/** The live changes one user may hear of: the whole group's, and those of the sites they see. */
export function createChangeFeed(scope: SiteScope, events: EventBus, streams: LiveStreamLimits) {
  return {
    /** A place for one more of the user's live streams (429 past the caps); the returned function gives it back. */
    claimStream(userId: number): () => void {
      return streams.claim(userId);
    },
    subscribe(listener: (event: ChangeEvent) => void): () => void {
      return events.subscribe((event) => {
        if (isInternalChange(event)) return;
        if (event.siteId === null || inScope(scope, event.siteId)) listener(event);
      });
    },
  };
}

export type ChangeFeed = ReturnType<typeof createChangeFeed>;

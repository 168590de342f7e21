import { EventEmitter } from 'node:events';
import type { ChangeEventType } from '../../shared/schemas/change-event';

/** `siteId` says whose change it is: a stream passes it only to users who see that site (null: the whole group's). */
type Change<T extends ChangeEventType, Extra = object> = { type: T; id: number; siteId: number | null } & Extra;

/** Only the types the client knows (shared/schemas/change-event.ts), so every one refreshes something there. */
export type ChangeEvent =
  | Change<'coat.created', { partIds: number[] }>
  | Change<'denib.created', { partIds: number[] }>
  | Change<'spray-session.changed'>
  | Change<'part.changed'>
  | Change<'reading.created', { boothId: number | null; rackId: number | null }>
  | Change<'product.changed'>
  | Change<'finish-system.changed'>;

/** In-process change feed for the live views; one per app. */
export class EventBus {
  private readonly emitter = new EventEmitter();

  constructor() {
    // Every open board holds one listener; a workshop has dozens, not thousands.
    this.emitter.setMaxListeners(500);
  }

  publish(event: ChangeEvent): void {
    this.emitter.emit('change', event);
  }

  subscribe(listener: (event: ChangeEvent) => void): () => void {
    this.emitter.on('change', listener);
    return () => this.emitter.off('change', listener);
  }
}

import { EventEmitter } from 'node:events';
import type { ChangeEventType } from '../../shared/schemas/change-event';

/** `siteId` says whose change it is: a stream passes it only to users who see that site (null: the whole group's). */
type Change<T extends ChangeEventType, Extra = object> = { type: T; id: number; siteId: number | null } & Extra;

/** The types the client knows (shared/schemas/change-event.ts), each refreshing something there, and the server's own internal ones. */
export type ChangeEvent =
  | Change<'coat.created', { partIds: number[] }>
  | Change<'denib.created', { partIds: number[] }>
  | Change<'spray-session.changed'>
  | Change<'part.changed'>
  | Change<'reading.created', { boothId: number | null; rackId: number | null }>
  | Change<'product.changed'>
  | Change<'finish-system.changed'>
  | InternalChange;

/**
 * Changes the server tells its own instances about (caches to clear), never sent to a browser:
 * a user changed (role, password, disabled, …), a sign-in session ended or changed, or a write
 * through the API made cached answers out of date.
 */
export type InternalChange =
  | { type: 'user.changed'; id: number; siteId: null }
  | { type: 'sign-in.changed'; sid: string; siteId: null }
  /** Something was written through the API: cached answers of that site (null: every site) are out of date. */
  | { type: 'answers.stale'; siteId: number | null };

const internalTypes = new Set<ChangeEvent['type']>(['user.changed', 'sign-in.changed', 'answers.stale']);
export const isInternalChange = (event: ChangeEvent): event is InternalChange => internalTypes.has(event.type);

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

import { EventEmitter } from 'node:events';

/** `siteId` says whose change it is: a stream passes it only to users who see that site (null: the whole group's). */
export type ChangeEvent =
  | { type: 'coat.created'; id: number; partIds: number[]; siteId: number | null }
  | { type: 'denib.created'; id: number; partIds: number[]; siteId: number | null }
  | { type: 'spray-session.changed'; id: number; siteId: number | null }
  | { type: 'part.changed'; id: number; siteId: number | null }
  | { type: 'reading.created'; id: number; boothId: number | null; rackId: number | null; siteId: number | null }
  | InternalChange;

/**
 * Changes the server tells its own instances about (caches to clear), never sent to a browser:
 * a user changed (role, password, disabled, …) or a sign-in session ended or changed.
 */
export type InternalChange = { type: 'user.changed'; id: number; siteId: null } | { type: 'sign-in.changed'; sid: string; siteId: null };

const internalTypes = new Set<ChangeEvent['type']>(['user.changed', 'sign-in.changed']);
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

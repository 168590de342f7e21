import { EventEmitter } from 'node:events';

export type ChangeEvent =
  | { type: 'coat.created'; id: number; partIds: number[] }
  | { type: 'denib.created'; id: number; partIds: number[] }
  | { type: 'spray-session.changed'; id: number }
  | { type: 'part.changed'; id: number }
  | { type: 'reading.created'; id: number; boothId: number | null; rackId: number | null };

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

/**
 * The kinds of change `GET /api/events` streams. The server publishes only these
 * (server/services/events.ts), and the client's live updates say what each one refreshes.
 */
export const changeEventTypes = [
  'coat.created',
  'denib.created',
  'spray-session.changed',
  'part.changed',
  'reading.created',
  'product.changed',
  'finish-system.changed',
] as const;
export type ChangeEventType = (typeof changeEventTypes)[number];

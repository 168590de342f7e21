/**
 * A fresh key for one coat record. crypto.randomUUID only exists on secure pages (https or
 * localhost); a booth tablet on the shop's own network may reach Boothwright over plain http,
 * so the key is built from getRandomValues there.
 */
export function newIdempotencyKey(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  bytes[6] = (bytes[6] & 0x0f) | 0x40;
  bytes[8] = (bytes[8] & 0x3f) | 0x80;
  const hex = [...bytes].map((b) => b.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

/** A stand-in id (below zero, so it can never be the server's) for a pot kept on the tablet. */
export function localMixId(): number {
  return -(crypto.getRandomValues(new Uint32Array(1))[0] + 1);
}

import { useSyncExternalStore } from 'react';

/** Whether the change stream is open: views say "reconnecting…" and poll while it is not. */
type LiveStatus = 'off' | 'connecting' | 'live' | 'reconnecting';

let status: LiveStatus = 'off';
const listeners = new Set<() => void>();

export function setLiveStatus(next: LiveStatus): void {
  if (next === status) return;
  status = next;
  listeners.forEach((listener) => listener());
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function useLiveStatus(): LiveStatus {
  return useSyncExternalStore(subscribe, () => status);
}

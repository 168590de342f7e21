import { useSyncExternalStore } from 'react';

/** Set by the service worker on an answer it took from its cache: the server's Date for that copy. */
const savedCopyHeader = 'x-boothwright-saved-at';

/** For each address read, when the copy shown was saved; only addresses answered from the cache. */
const savedAt = new Map<string, number>();
const listeners = new Set<() => void>();
let oldest: number | null = null;

function publish(): void {
  oldest = savedAt.size ? Math.min(...savedAt.values()) : null;
  listeners.forEach((listener) => listener());
}

/** Called for every successful read: a fresh answer clears its address, a saved copy records its age. */
export function noteReadAnswer(url: string, response: Response): void {
  const header = response.headers.get(savedCopyHeader);
  const at = header ? Date.parse(header) : NaN;
  const had = savedAt.has(url);
  if (header !== null) savedAt.set(url, Number.isNaN(at) ? Date.now() : at);
  else if (had) savedAt.delete(url);
  else return;
  publish();
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/**
 * When the oldest saved copy on screen was written by the server (epoch ms), or null when every
 * read came fresh from the network. With no network the tablet shows its last copies, and says so.
 */
export function useSavedCopyTime(): number | null {
  return useSyncExternalStore(
    subscribe,
    () => oldest,
    () => null,
  );
}

/** The service worker's store of API answers (pwa.config.ts names it). */
const savedCopiesCache = 'boothwright-api';

/** Forgets every saved copy, so the next person on this tablet never sees the last one's data offline. */
export async function forgetSavedCopies(): Promise<void> {
  savedAt.clear();
  publish();
  if (typeof caches !== 'undefined') await caches.delete(savedCopiesCache).catch(() => false);
}

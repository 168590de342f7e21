import { useQueryClient, type QueryClient, type QueryKey } from '@tanstack/react-query';
import { useEffect, useRef } from 'react';
import { z } from 'zod';
import { setLiveStatus } from './live-status';

/** A change from GET /api/events; only its type decides what to refresh, so unknown fields are ignored. */
const liveChangeSchema = z.object({ type: z.string(), id: z.number().optional(), partIds: z.array(z.number()).optional() });
export type LiveChange = z.infer<typeof liveChangeSchema>;

/** While the stream is down, open views refresh this often instead. */
export const livePollMs = 15_000;
// Events come in bursts (a coat on twenty parts, a session moved and saved); one refetch serves the burst.
const batchMs = 250;
const firstReopenMs = 3_000;
const maxReopenMs = 30_000;

interface LiveUpdatesOptions {
  /** Query key prefixes to refresh for a change. */
  keysFor: (change: LiveChange) => readonly QueryKey[];
  /** Everything the live views show: polled while the stream is down, and refreshed after a gap in which changes may have been missed. */
  allKeys: readonly QueryKey[];
}

function parseChange(data: unknown): LiveChange | null {
  try {
    const parsed = liveChangeSchema.safeParse(JSON.parse(String(data)));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

/** One open change stream with its polling fallback; `close` stops both. */
class LiveStream {
  private source: EventSource | null = null;
  private reopenTimer: number | undefined;
  private pollTimer: number | undefined;
  private flushTimer: number | undefined;
  private reopenMs = firstReopenMs;
  private missedSome = false;
  private readonly pending = new Map<string, QueryKey>();

  constructor(
    private readonly queryClient: QueryClient,
    private readonly options: { current: LiveUpdatesOptions },
  ) {
    setLiveStatus('connecting');
    this.open();
  }

  close(): void {
    this.source?.close();
    window.clearTimeout(this.reopenTimer);
    window.clearTimeout(this.flushTimer);
    window.clearInterval(this.pollTimer);
    setLiveStatus('off');
  }

  private open(): void {
    const source = new EventSource('/api/events');
    this.source = source;
    source.onopen = () => this.connected();
    source.addEventListener('change', (event) => {
      const change = parseChange(event.data);
      this.refresh(change ? this.options.current.keysFor(change) : this.options.current.allKeys);
    });
    source.onerror = () => this.lost(source);
  }

  private connected(): void {
    setLiveStatus('live');
    this.reopenMs = firstReopenMs;
    window.clearInterval(this.pollTimer);
    this.pollTimer = undefined;
    if (this.missedSome) this.refresh(this.options.current.allKeys);
    this.missedSome = false;
  }

  private lost(source: EventSource): void {
    this.missedSome = true;
    setLiveStatus('reconnecting');
    this.pollTimer ??= window.setInterval(() => this.refresh(this.options.current.allKeys), livePollMs);
    // The browser retries a dropped stream by itself, but gives up for good on an error answer (a 502 from a proxy, a 401).
    if (source.readyState !== EventSource.CLOSED) return;
    source.close();
    window.clearTimeout(this.reopenTimer);
    this.reopenTimer = window.setTimeout(() => this.open(), this.reopenMs);
    this.reopenMs = Math.min(this.reopenMs * 2, maxReopenMs);
  }

  private refresh(keys: readonly QueryKey[]): void {
    keys.forEach((key) => this.pending.set(JSON.stringify(key), key));
    this.flushTimer ??= window.setTimeout(() => this.flush(), batchMs);
  }

  private flush(): void {
    this.flushTimer = undefined;
    const keys = [...this.pending.values()];
    this.pending.clear();
    // Prefix match; only queries on screen refetch now, the rest are marked stale for their next use.
    keys.forEach((queryKey) => void this.queryClient.invalidateQueries({ queryKey }));
  }
}

/**
 * Keeps every open board, calendar and log current: listens to the server's change stream and
 * refreshes the queries a change touches; polls while the stream is down. Mount once, for the
 * signed-in user (`userId` null closes the stream).
 */
export function useLiveUpdates(userId: number | null, options: LiveUpdatesOptions): void {
  const queryClient = useQueryClient();
  const latest = useRef(options);
  useEffect(() => {
    latest.current = options;
  });
  useEffect(() => {
    if (userId === null) return;
    const stream = new LiveStream(queryClient, latest);
    return () => stream.close();
  }, [queryClient, userId]);
}

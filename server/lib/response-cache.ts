/** One cached answer: its JSON bytes and their strong ETag, and once asked for, the same compressed. */
export interface CachedAnswer {
  body: Buffer;
  etag: string;
  /** Compressed once, off the event loop, the first time a client that accepts gzip asks. */
  gzipped?: Promise<Buffer>;
  /** The same for brotli. */
  brotli?: Promise<Buffer>;
}

/** Whose changes clear an entry: one site's (and group-wide ones), or a change on any site. */
export type ClearedBy = number | 'any';

interface Entry extends CachedAnswer {
  clearedBy: ClearedBy;
  /** Epoch ms after which the entry is not served. */
  until: number;
  bytes: number;
}

// The Map entry, key and bookkeeping each entry costs besides its body, roughly.
const entryOverheadBytes = 200;

/**
 * Answers to GET requests kept in memory, least recently used dropped first once their bytes pass
 * the bound. Entries are cleared by site through `clear` (the change feed calls it on every
 * instance); a read that began before a clear must not store what it found, so writers take a
 * `stamp` before reading and hand it to `set`.
 */
export class ResponseCache {
  private readonly entries = new Map<string, Entry>();
  private bytes = 0;
  private clears = 0;
  /** Answers being worked out, by key, with the stamp they began under. */
  private readonly underWay = new Map<string, { stamp: number; answer: Promise<CachedAnswer | undefined> }>();

  constructor(
    readonly maxBytes: number,
    private readonly nowMs: () => number = Date.now,
  ) {}

  get size(): number {
    return this.entries.size;
  }

  get heldBytes(): number {
    return this.bytes;
  }

  get(key: string): CachedAnswer | undefined {
    const entry = this.entries.get(key);
    if (!entry) return undefined;
    if (entry.until <= this.nowMs()) {
      this.drop(key, entry);
      return undefined;
    }
    // Re-inserting moves it to the newest end: the Map's order is the recency order.
    this.entries.delete(key);
    this.entries.set(key, entry);
    return entry;
  }

  /** Taken before reading from the database; hand it to `set`. */
  stamp(): number {
    return this.clears;
  }

  /** Keeps an answer unless something was cleared since `stamp` (it may be this very answer's data). */
  set(key: string, answer: CachedAnswer, clearedBy: ClearedBy, until: number, stamp: number): void {
    const bytes = answer.body.length + key.length * 2 + entryOverheadBytes;
    if (stamp !== this.clears || bytes > this.maxBytes || until <= this.nowMs()) return;
    const old = this.entries.get(key);
    if (old) this.drop(key, old);
    this.entries.set(key, { ...answer, clearedBy, until, bytes });
    this.bytes += bytes;
    for (const [oldest, entry] of this.entries) {
      if (this.bytes <= this.maxBytes) break;
      this.drop(oldest, entry);
    }
  }

  /**
   * The answer for `key` another request is working out, if it began since the last clear. When a
   * change reaches every screen at once, each asks again within the same moment; they wait for one
   * answer rather than each work out the same board. It resolves to undefined when that work ends
   * without an answer to share (an error, another status).
   */
  underWayFor(key: string): Promise<CachedAnswer | undefined> | undefined {
    const work = this.underWay.get(key);
    return work && work.stamp === this.clears ? work.answer : undefined;
  }

  /** Says the answer for `key` is being worked out from `stamp` on, until `answer` settles. */
  workingOn(key: string, stamp: number, answer: Promise<CachedAnswer | undefined>): void {
    this.underWay.set(key, { stamp, answer });
    void answer.finally(() => {
      if (this.underWay.get(key)?.answer === answer) this.underWay.delete(key);
    });
  }

  /** A change on one site clears that site's answers and those reading across sites; null clears everything. */
  clear(siteId: number | null): void {
    this.clears += 1;
    if (siteId === null) {
      this.entries.clear();
      this.bytes = 0;
      return;
    }
    for (const [key, entry] of this.entries)
      if (entry.clearedBy === 'any' || entry.clearedBy === siteId) this.drop(key, entry);
  }

  private drop(key: string, entry: Entry): void {
    this.entries.delete(key);
    this.bytes -= entry.bytes;
  }
}

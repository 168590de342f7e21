import { openDB, type DBSchema, type IDBPDatabase, type IDBPTransaction } from 'idb';
import { z } from 'zod';
import { createCoatSchema } from '../../../../shared/schemas/coat';

const pendingCoatSchema = z.object({
  body: createCoatSchema.extend({ idempotencyKey: z.string().min(8) }),
  label: z.string(),
  queuedAt: z.string(),
  /** Set when the server answered but refused the coat: resending cannot help, a person must look. */
  problem: z.string().nullable(),
});
export type PendingCoat = z.infer<typeof pendingCoatSchema>;

interface QueueDb extends DBSchema {
  /** `seq` grows with each coat queued, so reading by key is the order they were sprayed in. */
  'pending-coats': { key: number; value: PendingCoat & { seq?: number }; indexes: { 'by-key': string } };
}

const storeName = 'pending-coats';
/** Where an earlier version of the app kept the queue, one list per spray session. */
const legacyPrefix = 'boothwright:pending-coats:session-';
const channelName = 'boothwright-coat-queue';

let opened: Promise<IDBPDatabase<QueueDb>> | null = null;
const listeners = new Set<() => void>();
const channel = typeof BroadcastChannel === 'undefined' ? null : new BroadcastChannel(channelName);
channel?.addEventListener('message', () => listeners.forEach((listener) => listener()));

function changed(): void {
  listeners.forEach((listener) => listener());
  channel?.postMessage('changed');
}

/** Each legacy list that could be read; one that cannot is left where it is, never thrown away. */
function legacyCoats(): { key: string; coats: PendingCoat[] }[] {
  return Object.keys(localStorage)
    .filter((key) => key.startsWith(legacyPrefix))
    .flatMap((key) => {
      try {
        const parsed = z.array(pendingCoatSchema).safeParse(JSON.parse(localStorage.getItem(key) ?? '[]'));
        return parsed.success ? [{ key, coats: parsed.data }] : [];
      } catch {
        return [];
      }
    });
}

/** Moves coats an earlier version left in localStorage into the queue once; a coat already there by its key is not added twice. */
async function moveLegacyCoats(db: IDBPDatabase<QueueDb>): Promise<void> {
  const lists = legacyCoats();
  if (lists.length === 0) return;
  const coats = lists.flatMap((list) => list.coats).sort((a, b) => a.queuedAt.localeCompare(b.queuedAt));
  const tx = db.transaction(storeName, 'readwrite');
  for (const coat of coats) {
    if (!(await tx.store.index('by-key').getKey(coat.body.idempotencyKey))) await tx.store.add(coat);
  }
  await tx.done;
  lists.forEach((list) => localStorage.removeItem(list.key));
}

function database(): Promise<IDBPDatabase<QueueDb>> {
  opened ??= openDB<QueueDb>('boothwright', 1, {
    upgrade(db) {
      db.createObjectStore(storeName, { keyPath: 'seq', autoIncrement: true }).createIndex(
        'by-key',
        'body.idempotencyKey',
        { unique: true },
      );
    },
  })
    .then(async (db) => {
      await moveLegacyCoats(db);
      return db;
    })
    .catch((error: unknown) => {
      opened = null;
      throw error;
    });
  return opened;
}

/** Every coat waiting on this tablet, oldest first. */
export async function queuedCoats(): Promise<PendingCoat[]> {
  const rows = await (await database()).getAll(storeName);
  return rows.map(({ seq: _seq, ...coat }) => coat);
}

export async function queueCoat(coat: PendingCoat): Promise<void> {
  await (await database()).add(storeName, coat);
  changed();
}

type QueueTx = IDBPTransaction<QueueDb, ['pending-coats'], 'readwrite'>;

async function edit(idempotencyKey: string, change: (seq: number, tx: QueueTx) => Promise<unknown>): Promise<void> {
  const tx = (await database()).transaction(storeName, 'readwrite');
  const seq = await tx.store.index('by-key').getKey(idempotencyKey);
  if (seq !== undefined) await change(seq, tx);
  await tx.done;
  changed();
}

export function removeQueued(idempotencyKey: string): Promise<void> {
  return edit(idempotencyKey, (seq, tx) => tx.store.delete(seq));
}

export function markRefused(idempotencyKey: string, problem: string): Promise<void> {
  return edit(idempotencyKey, async (seq, tx) => {
    const coat = await tx.store.get(seq);
    if (coat) await tx.store.put({ ...coat, problem });
  });
}

/** Told after any change to the queue, in this tab or another. */
export function onQueueChange(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

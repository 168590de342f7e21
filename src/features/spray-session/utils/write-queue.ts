import { openDB, type DBSchema, type IDBPDatabase, type IDBPTransaction } from 'idb';
import { z } from 'zod';
import type { ChecklistEvaluation } from '../../../../shared/finishing/checklist';
import type { CreateMixInput } from '../../../../shared/schemas/checklist';
import { createCoatSchema } from '../../../../shared/schemas/coat';
import type { CreateDenibInput } from '../../../../shared/schemas/denib';
import type { UpdateSpraySessionInput } from '../../../../shared/schemas/spray-session';

const pendingCoatSchema = z.object({
  body: createCoatSchema.extend({ idempotencyKey: z.string().min(8) }),
  label: z.string(),
  queuedAt: z.string(),
  /** Set when the server answered but refused the write: resending cannot help, a person must look. */
  problem: z.string().nullable(),
});
type LegacyCoat = z.infer<typeof pendingCoatSchema>;
type Keyed<T> = T & { idempotencyKey: string };

interface WriteBase {
  spraySessionId: number;
  label: string;
  queuedAt: string;
  problem: string | null;
}

/** One write a sprayer made in the booth, kept on the tablet until the server has it. */
export type PendingWrite = WriteBase &
  (
    | { kind: 'coat'; body: LegacyCoat['body'] }
    /** `localId` (negative) stands for the pot's id until the server gives it one; a coat may name it as its mix. */
    | { kind: 'mix'; body: Keyed<CreateMixInput> & { mixedAt: string }; localId: number }
    | { kind: 'denib'; body: Keyed<CreateDenibInput> }
    /** Checks, start or stop; `verdict` is the tablet's own reading of the checks until the server's comes. */
    | {
        kind: 'session';
        body: Keyed<UpdateSpraySessionInput> & { changedAt: string };
        verdict?: ChecklistEvaluation | null;
      }
  );
export type PendingKind = PendingWrite['kind'];
/** A write as a form hands it over, before the queue adds its time and state (one shape per kind). */
export type NewWrite = PendingWrite extends infer W
  ? W extends PendingWrite
    ? Omit<W, 'queuedAt' | 'problem'>
    : never
  : never;

/** Rows an earlier version kept have no kind and no session id of their own: they are coats. */
type StoredWrite = Omit<PendingWrite, 'kind' | 'spraySessionId'> & {
  kind?: PendingKind;
  spraySessionId?: number;
  seq?: number;
};

interface QueueDb extends DBSchema {
  /** `seq` grows with each write queued, so reading by key is the order they were made in. */
  'pending-coats': { key: number; value: StoredWrite; indexes: { 'by-key': string } };
}

// The store keeps its first name (it held coats only), so writes queued by an earlier version are still sent.
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
function legacyCoats(): { key: string; coats: LegacyCoat[] }[] {
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

function fromStore({ seq: _seq, ...row }: StoredWrite): PendingWrite {
  if (row.kind && row.kind !== 'coat') return row as PendingWrite;
  const body = row.body as LegacyCoat['body'];
  return { ...row, kind: 'coat', body, spraySessionId: row.spraySessionId ?? body.spraySessionId };
}

/** Every write waiting on this tablet, in the order made. */
export async function queuedWrites(): Promise<PendingWrite[]> {
  return (await (await database()).getAll(storeName)).map(fromStore);
}

export async function queueWrite(write: PendingWrite): Promise<void> {
  await (await database()).add(storeName, write);
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
    const write = await tx.store.get(seq);
    if (write) await tx.store.put({ ...write, problem });
  });
}

/** The pot is on the server: coats waiting with its stand-in id name the server's id, in the same step as it leaves the queue. */
export function settleMix(idempotencyKey: string, localId: number, mixId: number): Promise<void> {
  return edit(idempotencyKey, async (seq, tx) => {
    let cursor = await tx.store.openCursor();
    while (cursor) {
      const body = cursor.value.body as { mixId?: number | null };
      if ((cursor.value.kind ?? 'coat') === 'coat' && body.mixId === localId)
        await cursor.update({ ...cursor.value, body: { ...cursor.value.body, mixId } } as StoredWrite);
      cursor = await cursor.continue();
    }
    await tx.store.delete(seq);
  });
}

/** Told after any change to the queue, in this tab or another. */
export function onQueueChange(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

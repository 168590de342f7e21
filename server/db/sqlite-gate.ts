import { AsyncLocalStorage } from 'node:async_hooks';
import type { DataSource, QueryRunner } from 'typeorm';

/**
 * TypeORM drives better-sqlite3 through ONE shared connection and one shared query runner. Left
 * alone, a query from one request issued while another request's transaction is open runs inside
 * that transaction: it reads writes that may yet roll back, and its own write (a session saved at
 * sign-in, say) is lost if that transaction rolls back. The gate gives the connection to one piece
 * of work at a time: a transaction holds it from BEGIN to COMMIT or ROLLBACK, and every other
 * query waits for it and holds it for its one statement. Who is asking is told apart by an async
 * context: each HTTP request runs in its own (`runAsOwnWork`), each `inTransaction` in its own.
 */
const work = new AsyncLocalStorage<object>();
// Work started outside any request or transaction (start-up, seeding, the scheduler) shares one identity.
const outsideAnyWork = {};
const currentWork = () => work.getStore() ?? outsideAnyWork;

/** Runs `fn` as a piece of work of its own, told apart from every other by the gate. */
export function runAsOwnWork<T>(fn: () => T): T {
  return work.run({}, fn);
}

export class Gate {
  holder: object | null = null;
  /** Set while a transaction that TypeORM began by itself (save() outside inTransaction) holds the gate. */
  releaseImplicit: (() => void) | null = null;
  private tail: Promise<void> = Promise.resolve();

  /** Waits for every earlier holder, first come first served; call the returned function to let the next in. */
  async acquire(owner: object): Promise<() => void> {
    const previous = this.tail;
    let open!: () => void;
    this.tail = new Promise<void>((resolve) => (open = resolve));
    await previous;
    this.holder = owner;
    return () => {
      this.holder = null;
      // better-sqlite3 answers synchronously, so a queue of waiting requests would otherwise run
      // one after another on microtasks alone, never letting the event loop read a new request or
      // accept a connection: under load the server served only the connections it already had,
      // and the event loop stalled for as long as the queue lasted. Handing over on the next
      // turn of the loop lets waiting I/O in between holders.
      setImmediate(open);
    };
  }
}

const gates = new WeakMap<DataSource, Gate>();

function guard(runner: QueryRunner, gate: Gate): void {
  const query = runner.query.bind(runner) as (...args: unknown[]) => Promise<unknown>;
  runner.query = (async (...args: unknown[]) => {
    const me = currentWork();
    if (gate.holder === me) return query(...args);
    const release = await gate.acquire(me);
    try {
      return await query(...args);
    } finally {
      release();
    }
  }) as QueryRunner['query'];

  const start = runner.startTransaction.bind(runner);
  runner.startTransaction = async (level) => {
    const me = currentWork();
    if (gate.holder === me) return start(level);
    const release = await gate.acquire(me);
    gate.releaseImplicit = release;
    await start(level).catch((error: unknown) => {
      gate.releaseImplicit = null;
      release();
      throw error;
    });
  };
  for (const name of ['commitTransaction', 'rollbackTransaction'] as const) {
    const end = runner[name].bind(runner);
    runner[name] = async () => {
      try {
        await end();
      } finally {
        if (!runner.isTransactionActive && gate.releaseImplicit) {
          const release = gate.releaseImplicit;
          gate.releaseImplicit = null;
          release();
        }
      }
    };
  }
}

/** The gate of a better-sqlite3 data source, put on its shared query runner the first time it is asked for. */
export function sqliteGate(dataSource: DataSource): Gate {
  let gate = gates.get(dataSource);
  if (!gate) {
    gate = new Gate();
    gates.set(dataSource, gate);
    guard(dataSource.createQueryRunner(), gate);
  }
  return gate;
}

/** Whether the work running now holds the gate (inside its own transaction, say). */
export function isHoldingConnection(gate: Gate): boolean {
  return gate.holder !== null && gate.holder === currentWork();
}

/** Runs `fn` holding the connection as a new piece of work; a call from inside the holder's own work just runs. */
export async function holdingConnection<T>(dataSource: DataSource, fn: () => Promise<T>): Promise<T> {
  const gate = sqliteGate(dataSource);
  if (gate.holder !== null && gate.holder === currentWork()) return fn();
  return runAsOwnWork(async () => {
    const release = await gate.acquire(currentWork());
    try {
      return await fn();
    } finally {
      release();
    }
  });
}

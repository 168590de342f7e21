import { randomUUID } from 'node:crypto';
import type pg from 'pg';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { AppConfig } from '../config/env';
import { EventBus, type ChangeEvent } from './events';

export const changeChannel = 'boothwright_changes';
// PostgreSQL refuses NOTIFY payloads of 8000 bytes or more; events carry ids only.
const maxPayloadBytes = 7900;
const firstRetryMs = 500;
const lastRetryMs = 30_000;

/** What goes through NOTIFY: the event and the instance that published it. */
interface SharedChange {
  from: string;
  event: ChangeEvent;
}

/**
 * The change feed shared by every app instance on one PostgreSQL database. `publish` hands the
 * event to this instance's subscribers (the open SSE streams) and sends it with pg_notify; each
 * instance LISTENs on one dedicated connection and hands what the others published to its own
 * subscribers. Callers see the same publish/subscribe as the in-process bus.
 */
export class PgEventBus extends EventBus {
  private readonly instanceId = randomUUID();
  private listener: pg.Client | null = null;
  private stopped = false;
  private retryMs = firstRetryMs;
  private retryTimer: NodeJS.Timeout | undefined;

  constructor(
    private readonly dataSource: DataSource,
    private readonly url: string,
    private readonly logger: Logger,
  ) {
    super();
  }

  /** Connects the listener; fails when PostgreSQL cannot be reached at start. */
  async start(): Promise<void> {
    await this.listen();
  }

  override publish(event: ChangeEvent): void {
    // Straight to this instance's own boards, so they hear it even while the listener reconnects.
    this.deliver(event);
    let payload = JSON.stringify({ from: this.instanceId, event } satisfies SharedChange);
    // A coat over a whole job's parts can outgrow NOTIFY; boards refresh by event type, so the ids can go.
    if (Buffer.byteLength(payload) > maxPayloadBytes && 'partIds' in event) payload = JSON.stringify({ from: this.instanceId, event: { ...event, partIds: [] } } satisfies SharedChange);
    if (Buffer.byteLength(payload) > maxPayloadBytes) {
      this.logger.error({ event: event.type, bytes: Buffer.byteLength(payload) }, 'change event too large to share with other instances');
      return;
    }
    this.dataSource.query('SELECT pg_notify($1, $2)', [changeChannel, payload]).catch((error: Error) => {
      this.logger.warn({ err: error, event: event.type }, 'could not share a change with other instances');
    });
  }

  async stop(): Promise<void> {
    this.stopped = true;
    clearTimeout(this.retryTimer);
    const client = this.listener;
    this.listener = null;
    await client?.end().catch(() => undefined);
  }

  private deliver(event: ChangeEvent): void {
    super.publish(event);
  }

  private async listen(): Promise<void> {
    // The name marks the connection in pg_stat_activity.
    // Loaded here, not at start: a shop on SQLite never loads the PostgreSQL driver.
    const { default: driver } = await import('pg');
    const client = new driver.Client({ connectionString: this.url, keepAlive: true, application_name: 'boothwright-change-feed' });
    client.on('error', (error) => this.lost(client, error));
    client.on('end', () => this.lost(client));
    client.on('notification', (message) => this.receive(message.payload));
    try {
      await client.connect();
      await client.query(`LISTEN ${changeChannel}`);
    } catch (error) {
      await client.end().catch(() => undefined);
      throw error;
    }
    if (this.stopped) {
      await client.end().catch(() => undefined);
      return;
    }
    this.listener = client;
    this.retryMs = firstRetryMs;
  }

  private receive(payload: string | undefined): void {
    if (!payload) return;
    try {
      const change = JSON.parse(payload) as SharedChange;
      if (change.from !== this.instanceId) this.deliver(change.event);
    } catch (error) {
      this.logger.warn({ err: error }, 'could not deliver a shared change');
    }
  }

  private lost(client: pg.Client, error?: Error): void {
    if (client !== this.listener) return;
    this.listener = null;
    void client.end().catch(() => undefined);
    if (this.stopped) return;
    this.logger.warn({ err: error }, 'lost the shared change feed; reconnecting');
    this.reconnectLater();
  }

  private reconnectLater(): void {
    this.retryTimer = setTimeout(() => {
      this.listen().catch((error: Error) => {
        this.logger.warn({ err: error, retryInMs: this.retryMs }, 'could not reconnect the shared change feed');
        this.reconnectLater();
      });
    }, this.retryMs);
    this.retryMs = Math.min(this.retryMs * 2, lastRetryMs);
  }
}

export interface RunningEventBus {
  events: EventBus;
  stop(): Promise<void>;
}

/** The change feed for this process: shared through PostgreSQL, or in-process on SQLite (one process). */
export async function startEventBus(dataSource: DataSource, config: AppConfig, logger: Logger): Promise<RunningEventBus> {
  if (config.database.kind !== 'postgres') return { events: new EventBus(), stop: async () => undefined };
  const bus = new PgEventBus(dataSource, config.database.url, logger);
  await bus.start();
  return { events: bus, stop: () => bus.stop() };
}

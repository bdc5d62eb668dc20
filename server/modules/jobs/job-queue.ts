import PgBoss from 'pg-boss';
import type { DataSource, EntityManager } from 'typeorm';
import { pgPool } from '../../db/data-source';

/** The queues the product uses, with how often and how patiently each retries. */
export const queues = {
  /** One e-mail from the `sent_emails` outbox: up to 6 attempts over about half an hour. */
  sendEmail: { name: 'email.send', retryLimit: 5, retryDelay: 30, retryBackoff: true },
} as const;

export type QueueKey = keyof typeof queues;

export interface JobQueueOptions {
  /**
   * Prefix for queue names. Empty in production; tests give each process its own so parallel
   * test files never take each other's jobs.
   */
  namespace?: string;
  /** Seconds between polls of an idle worker (at least 0.5). */
  pollingIntervalSeconds?: number;
  /** Overrides of each queue's retry limit (tests use 0 to see a final failure at once). */
  retryLimit?: number;
  /**
   * Run pg-boss maintenance here (expire jobs whose worker died, archive, purge): on in the
   * processes that run workers, off in send-only ones.
   */
  supervise?: boolean;
  /** Where pg-boss reports background errors. */
  log?: (error: unknown) => void;
}

type Executor = { executeSql(text: string, values: unknown[]): Promise<{ rows: unknown[] }> };

/**
 * A PostgreSQL-backed job queue (pg-boss) over the app's own connection pool. Sending needs no
 * running worker: a job enqueued inside a transaction is committed or rolled back with it, so a
 * request never does background work and a failed request leaves no stray job behind.
 */
export class JobQueue {
  private readonly boss: PgBoss;
  private ready: Promise<void> | null = null;
  private workersOn = false;
  private readonly executor: Executor;

  constructor(
    db: DataSource,
    private readonly options: JobQueueOptions = {},
  ) {
    const pool = pgPool(db);
    const executor: Executor = { executeSql: (text, values) => pool.query(text, values) };
    this.executor = executor;
    this.boss = new PgBoss({
      db: executor as PgBoss.Db,
      supervise: options.supervise ?? false,
      schedule: false,
      migrate: true,
    });
    this.boss.on('error', (error) => (options.log ?? console.error)(error));
  }

  /** The stored name of a queue (namespaced in tests). */
  nameOf(key: QueueKey): string {
    return `${this.options.namespace ?? ''}${queues[key].name}`;
  }

  /** Creates pg-boss's schema (first time only) and the product's queues; safe to call often. */
  start(): Promise<void> {
    this.ready ??= (async () => {
      await this.boss.start();
      for (const key of Object.keys(queues) as QueueKey[]) {
        const { retryLimit, retryDelay, retryBackoff } = queues[key];
        await this.boss.createQueue(this.nameOf(key), {
          name: this.nameOf(key),
          retryLimit: this.options.retryLimit ?? retryLimit,
          retryDelay,
          retryBackoff,
        });
      }
    })().catch((error) => {
      this.ready = null;
      throw error;
    });
    return this.ready;
  }

  /**
   * Enqueues a job in the caller's transaction: it exists only if that transaction commits.
   * Returns the job id.
   */
  async send(tx: EntityManager, key: QueueKey, data: object): Promise<string> {
    await this.start();
    const inTransaction: Executor = {
      executeSql: async (text, values) => ({ rows: await tx.query(text, values) }),
    };
    const id = await this.boss.send(this.nameOf(key), data, { db: inTransaction as PgBoss.Db });
    if (!id) throw new Error(`the queue ${this.nameOf(key)} refused a job`);
    return id;
  }

  /** Runs `handler` for each job of the queue in this process; a thrown error means "retry". */
  async work<T extends object>(
    key: QueueKey,
    handler: (job: PgBoss.JobWithMetadata<T>) => Promise<void>,
  ): Promise<void> {
    await this.start();
    this.workersOn = true;
    await this.boss.work<T>(
      this.nameOf(key),
      {
        includeMetadata: true,
        batchSize: 1,
        pollingIntervalSeconds: this.options.pollingIntervalSeconds ?? 2,
      },
      async ([job]) => handler(job),
    );
  }

  /** Stops polling and waits for jobs in hand to finish (up to `timeoutMs`). */
  async stop(timeoutMs = 10_000): Promise<void> {
    if (!this.ready) return;
    await this.ready.catch(() => undefined);
    await this.boss.stop({ graceful: this.workersOn, timeout: timeoutMs, close: false });
    this.ready = null;
  }

  /** Removes this queue namespace's queues and their jobs (tests clean up after themselves). */
  async dropQueues(): Promise<void> {
    if (!this.options.namespace) throw new Error('only a namespaced (test) queue may be dropped');
    for (const key of Object.keys(queues) as QueueKey[]) {
      // Failed and finished jobs would hold the queue through its foreign key: remove them first.
      await this.executor.executeSql(`DELETE FROM pgboss.job WHERE name = $1`, [this.nameOf(key)]);
      await this.boss.deleteQueue(this.nameOf(key));
    }
  }
}

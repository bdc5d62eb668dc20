import 'reflect-metadata';
import type { Server } from 'node:http';
import { loadEnv } from './config/env';
import { createDataSource } from './db/data-source';
import { createApp } from './app';
import { JobQueue } from './modules/jobs/job-queue';
import { startBackgroundWork } from './modules/jobs/background-work';

/** Starts the server: configuration → database → listen; stops cleanly on SIGINT/SIGTERM. */
async function main() {
  const env = loadEnv();
  const db = createDataSource({
    url: env.DATABASE_URL,
    poolSize: env.DATABASE_POOL_SIZE,
    statementTimeoutMs: env.DATABASE_STATEMENT_TIMEOUT_MS,
  });
  await db.initialize();
  // This process also runs the job workers (e-mail); pg-boss shares the work among app servers.
  const jobs = new JobQueue(db, { supervise: true, log: console.error });
  const background = await startBackgroundWork({ db, env, jobs });
  const app = createApp({ db, env, jobs });
  const server: Server = app.listen(env.PORT, env.HOST, () => {
    console.log(`[server] listening on http://${env.HOST}:${env.PORT}`);
  });
  const stop = () => {
    server.close(
      () =>
        void background
          .stop()
          .finally(() => db.destroy())
          .finally(() => process.exit(0)),
    );
    server.closeAllConnections();
    setTimeout(() => process.exit(0), 3_000).unref();
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((error) => {
  console.error('[server] failed to start:', error instanceof Error ? error.message : error);
  process.exit(1);
});

import type { DataSource } from 'typeorm';
import type { Env } from '../../config/env';
import { startEmailWorker } from '../emails/email-worker';
import { createSmtpMailer, type Mailer } from '../emails/mailer';
import type { JobQueue } from './job-queue';

/**
 * Starts this process's workers: every queued e-mail is sent from here, never from a request.
 * Any number of app servers may run them; pg-boss hands each job to one.
 */
export async function startBackgroundWork({
  db,
  env,
  jobs,
  mailer = createSmtpMailer(env),
}: {
  db: DataSource;
  env: Env;
  jobs: JobQueue;
  mailer?: Mailer;
}) {
  await jobs.start();
  await startEmailWorker(db, jobs, mailer);
  return {
    async stop() {
      await jobs.stop();
      mailer.close();
    },
  };
}

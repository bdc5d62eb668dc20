import 'reflect-metadata';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import supertest from 'supertest';
import type { DataSource } from 'typeorm';
import { createApp } from '../../../../server/app';
import { loadEnv, type Env } from '../../../../server/config/env';
import { createDataSource } from '../../../../server/db/data-source';
import { JobQueue } from '../../../../server/modules/jobs/job-queue';
import { startBackgroundWork } from '../../../../server/modules/jobs/background-work';
import { startFakeSmtp, type OutboxMessage } from '../../../../scripts/fake-smtp';

export const appUrl = 'http://duskhaul.test';

/**
 * The real app with e-mail end to end: a fake SMTP server on a free loopback port, the e-mail
 * worker running in this process on a queue of its own (so parallel test files never take each
 * other's jobs), and documents stored in a fresh temporary folder.
 */
export async function startMailTestApp(overrides: Partial<Record<keyof Env, string>> = {}) {
  const fake = await startFakeSmtp({ smtpPort: 0, httpPort: 0 });
  const documentsDir = await mkdtemp(path.join(tmpdir(), 'duskhaul-documents-'));
  const env = loadEnv({
    ...process.env,
    NODE_ENV: 'test',
    CLIENT_DIST: 'no-client-in-api-tests',
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(fake.smtpPort),
    SMTP_SECURE: 'false',
    MAIL_FROM: 'Duskhaul test <no-reply@duskhaul.test>',
    APP_URL: appUrl,
    DOCUMENTS_DIR: documentsDir,
    ...overrides,
  });
  const db: DataSource = createDataSource({ url: env.DATABASE_URL, poolSize: 15 });
  await db.initialize();
  const jobs = new JobQueue(db, {
    namespace: `test-${randomUUID().slice(0, 8)}.`,
    pollingIntervalSeconds: 0.5,
    log: () => undefined,
  });
  const background = await startBackgroundWork({ db, env, jobs });
  const app = createApp({
    db,
    env,
    jobs,
    log: process.env.TEST_LOG ? console.error : () => undefined,
  });
  return {
    app,
    db,
    env,
    fake,
    jobs,
    documentsDir,
    async close() {
      await background.stop();
      await jobs.dropQueues().catch(() => undefined);
      await fake.stop();
      await db.destroy();
      await rm(documentsDir, { recursive: true, force: true });
    },
  };
}

export type MailTestApp = Awaited<ReturnType<typeof startMailTestApp>>;

/** The link after a label in an e-mail's text part ("Label:\n  https://…"). */
export function linkAfter(message: OutboxMessage, label: string): string {
  const lines = message.text.split('\n');
  const at = lines.findIndex((l) => l.trim() === `${label}:`);
  if (at < 0) throw new Error(`no "${label}" link in: ${message.text}`);
  return lines[at + 1].trim();
}

/** The path part of an app link, for supertest. */
export const pathOf = (link: string) => link.slice(appUrl.length);

/** Polls until `check` returns a value (or the time is up). */
export async function eventually<T>(
  check: () => Promise<T | null | undefined | false>,
  timeoutMs = 15_000,
): Promise<T> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const value = await check();
    if (value) return value;
    if (Date.now() > until) throw new Error('condition not met in time');
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** Every e-mail recorded for the operation, once none is still queued. */
export async function settledEmails(db: DataSource, operationId: string) {
  return eventually(async () => {
    const rows: Array<{
      recipient: string;
      subject: string;
      status: string;
      provider_message_id: string | null;
      purpose: string;
    }> = await db.query(
      `SELECT recipient, subject, status, provider_message_id, purpose FROM sent_emails
          WHERE operation_id = $1 ORDER BY created_at`,
      [operationId],
    );
    return rows.every((r) => r.status !== 'queued') ? rows : null;
  });
}

export { supertest };

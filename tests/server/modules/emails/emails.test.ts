import 'reflect-metadata';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { loadEnv } from '../../../../server/config/env';
import { createDataSource } from '../../../../server/db/data-source';
import { queueEmail } from '../../../../server/modules/emails/email-outbox';
import { startEmailWorker } from '../../../../server/modules/emails/email-worker';
import { createSmtpMailer } from '../../../../server/modules/emails/mailer';
import { JobQueue } from '../../../../server/modules/jobs/job-queue';
import { startFakeSmtp, type FakeSmtp } from '../../../../scripts/fake-smtp';
import { createOperation } from '../../../support/factories';
import { eventually } from './support';

let db: DataSource;
let fake: FakeSmtp;
const env = loadEnv({ ...process.env, NODE_ENV: 'test' });

beforeAll(async () => {
  db = createDataSource({ url: env.DATABASE_URL, poolSize: 5 });
  await db.initialize();
  fake = await startFakeSmtp();
});
afterAll(async () => {
  await fake?.stop();
  await db?.destroy();
});

const message = (to: string) => ({
  to,
  subject: 'Test: hives at dusk',
  text: 'Plain part.',
  html: '<p>HTML part.</p>',
  attachments: [{ filename: 'a.ics', contentType: 'text/calendar', content: 'BEGIN:VCALENDAR' }],
});

describe('the fake SMTP outbox over HTTP', () => {
  it('when a message is sent then GET /messages lists it, /messages/:id has its attachment, DELETE empties it', async () => {
    const mailer = createSmtpMailer({ ...env, SMTP_HOST: '127.0.0.1', SMTP_PORT: fake.smtpPort });
    const { messageId } = await mailer.send(message('reader@example.test'));
    mailer.close();
    const list = await (await fetch(`${fake.outboxUrl}/messages`)).json();
    const found = list.find((m: { messageId: string }) => m.messageId === messageId);
    expect(found).toMatchObject({
      to: ['reader@example.test'],
      subject: 'Test: hives at dusk',
      text: 'Plain part.',
    });
    expect(found.html).toContain('HTML part.');
    const one = await (await fetch(`${fake.outboxUrl}/messages/${found.id}`)).json();
    expect(one.attachments[0]).toMatchObject({ filename: 'a.ics', text: 'BEGIN:VCALENDAR' });
    const page = await fetch(`${fake.outboxUrl}/`);
    expect(await page.text()).toContain('Test: hives at dusk');
    expect((await fetch(`${fake.outboxUrl}/messages`, { method: 'DELETE' })).status).toBe(204);
    expect(await (await fetch(`${fake.outboxUrl}/messages`)).json()).toEqual([]);
    expect((await fetch(`${fake.outboxUrl}/messages/999`)).status).toBe(404);
  });
});

describe('the send-email job', () => {
  it('when the transaction rolls back then neither the sent_emails row nor the job exists', async () => {
    const operationId = await createOperation(db);
    const jobs = new JobQueue(db, { namespace: `test-${randomUUID().slice(0, 8)}.` });
    await db
      .transaction(async (tx) => {
        await queueEmail(
          tx,
          jobs,
          { operationId, purpose: 'spray-notice', relatedKind: 'test', relatedId: randomUUID() },
          message('nobody@example.test'),
        );
        throw new Error('roll back');
      })
      .catch(() => undefined);
    expect(
      await db.query(`SELECT 1 FROM sent_emails WHERE operation_id = $1`, [operationId]),
    ).toEqual([]);
    const [{ count }] = await db.query(
      `SELECT count(*)::int AS count FROM pgboss.job WHERE name = $1`,
      [jobs.nameOf('sendEmail')],
    );
    expect(count).toBe(0);
    await jobs.dropQueues().catch(() => undefined); // cleanup only
  });

  it('when the SMTP server is unreachable on the last attempt then the row is marked failed with the reason', async () => {
    const operationId = await createOperation(db);
    const jobs = new JobQueue(db, {
      namespace: `test-${randomUUID().slice(0, 8)}.`,
      pollingIntervalSeconds: 0.5,
      retryLimit: 0,
      log: () => undefined,
    });
    const dead = createSmtpMailer({ ...env, SMTP_HOST: '127.0.0.1', SMTP_PORT: 9 });
    await startEmailWorker(db, jobs, dead);
    const id = await db.transaction((tx) =>
      queueEmail(
        tx,
        jobs,
        { operationId, purpose: 'spray-notice', relatedKind: 'test', relatedId: randomUUID() },
        message('nobody@example.test'),
      ),
    );
    const row = await eventually(async () => {
      const [r] = await db.query(
        `SELECT status, attempts, last_error, failed_at FROM sent_emails WHERE id = $1`,
        [id],
      );
      return r.status === 'failed' ? r : null;
    });
    expect(row.attempts).toBe(1);
    expect(row.last_error).toMatch(/ECONNREFUSED|ESOCKET|connect/i);
    expect(row.failed_at).not.toBeNull();
    await jobs.stop();
    dead.close();
    await jobs.dropQueues().catch(() => undefined); // cleanup only
  });
});

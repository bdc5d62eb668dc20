import type { DataSource } from 'typeorm';
import type { JobQueue } from '../jobs/job-queue';
import type { SendEmailJob } from './email-outbox';
import type { Mailer } from './mailer';
import { returningRows } from '../jobs/returning-rows';

/**
 * Sends queued e-mails. Each attempt is counted on the outbox row; a failure is rethrown so
 * pg-boss retries it later, and the last allowed attempt marks the row failed.
 */
export async function startEmailWorker(db: DataSource, jobs: JobQueue, mailer: Mailer) {
  await jobs.work<SendEmailJob>('sendEmail', async (job) => {
    const { sentEmailId, message } = job.data;
    const [row] = returningRows<{ status: string }>(
      await db.query(
        `UPDATE sent_emails SET attempts = attempts + 1 WHERE id = $1 RETURNING status`,
        [sentEmailId],
      ),
    );
    // Already sent (a retry after a crash between sending and recording): do not send twice.
    if (!row || row.status === 'sent') return;
    try {
      const { messageId } = await mailer.send(message);
      await db.query(
        `UPDATE sent_emails SET status = 'sent', provider_message_id = $2, sent_at = now(),
                last_error = NULL WHERE id = $1`,
        [sentEmailId, messageId],
      );
    } catch (error) {
      const finalAttempt = job.retryCount >= job.retryLimit;
      await db.query(
        `UPDATE sent_emails SET last_error = $2,
                status = CASE WHEN $3 THEN 'failed' ELSE status END,
                failed_at = CASE WHEN $3 THEN now() ELSE failed_at END
          WHERE id = $1`,
        [sentEmailId, describe(error), finalAttempt],
      );
      throw error;
    }
  });
}

// The SMTP error without the message body or its links.
function describe(error: unknown): string {
  const e = error as { code?: string; responseCode?: number; message?: string };
  return [e.code, e.responseCode, e.message?.slice(0, 300)].filter(Boolean).join(' ');
}

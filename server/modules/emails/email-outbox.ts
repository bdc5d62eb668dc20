import type { EntityManager } from 'typeorm';
import type { JobQueue } from '../jobs/job-queue';
import type { MailMessage } from './mailer';

/** Why an e-mail was sent and what it is about, recorded in `sent_emails`. */
export interface EmailPurpose {
  operationId: string;
  purpose: 'proposal' | 'proposal-answer' | 'dates-agreed' | 'spray-notice' | 'invoice';
  relatedKind: string;
  relatedId: string;
}

/** What the send-email job carries: the outbox row and the rendered message. */
export interface SendEmailJob {
  sentEmailId: string;
  message: MailMessage;
}

/**
 * Records the e-mail as queued and enqueues its sending, both in the caller's transaction: a
 * rolled-back request sends nothing, and a committed one is sent by a worker, with retries.
 */
export async function queueEmail(
  tx: EntityManager,
  jobs: JobQueue,
  purpose: EmailPurpose,
  message: MailMessage,
): Promise<string> {
  const [row] = await tx.query(
    `INSERT INTO sent_emails (operation_id, recipient, subject, purpose, related_kind, related_id, status)
     VALUES ($1, $2, $3, $4, $5, $6, 'queued') RETURNING id`,
    [
      purpose.operationId,
      message.to,
      message.subject,
      purpose.purpose,
      purpose.relatedKind,
      purpose.relatedId,
    ],
  );
  const job: SendEmailJob = { sentEmailId: row.id, message };
  await jobs.send(tx, 'sendEmail', job);
  return row.id as string;
}

/** The e-mail addresses of a grower's contacts, each once. */
export async function growerContactAddresses(
  tx: EntityManager,
  operationId: string,
  growerId: string,
): Promise<string[]> {
  const rows: Array<{ email: string }> = await tx.query(
    `SELECT email FROM grower_contacts
      WHERE operation_id = $1 AND grower_id = $2 AND email IS NOT NULL AND email <> ''
      ORDER BY position, name`,
    [operationId, growerId],
  );
  return unique(rows.map((r) => r.email));
}

/** The active owners and planners of the operation: who hears about growers' answers. */
export async function plannerRecipients(
  tx: EntityManager,
  operationId: string,
): Promise<Array<{ id: string; email: string; name: string }>> {
  return tx.query(
    `SELECT id, email, name FROM users
      WHERE operation_id = $1 AND active AND role IN ('owner', 'planner')
      ORDER BY role DESC, name`,
    [operationId],
  );
}

function unique(addresses: string[]): string[] {
  const seen = new Set<string>();
  return addresses.filter((a) => {
    const key = a.trim().toLowerCase();
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

import type { EntityManager } from 'typeorm';
import { plannerRecipients } from '../emails/email-outbox';

export interface NotificationInput {
  kind: 'proposal-confirmed' | 'proposal-declined' | 'proposal-countered' | 'spray-notice-filed';
  title: string;
  body: string;
  relatedKind: 'contract' | 'spray-notice';
  relatedId: string;
}

/** Leaves an in-app notice for every active owner and planner of the operation. */
export async function notifyPlanners(
  tx: EntityManager,
  operationId: string,
  notice: NotificationInput,
): Promise<void> {
  const planners = await plannerRecipients(tx, operationId);
  for (const planner of planners) {
    await tx.query(
      `INSERT INTO notifications (operation_id, user_id, kind, title, body, related_kind, related_id)
       VALUES ($1, $2, $3, $4, $5, $6, $7)`,
      [
        operationId,
        planner.id,
        notice.kind,
        notice.title,
        notice.body,
        notice.relatedKind,
        notice.relatedId,
      ],
    );
  }
}

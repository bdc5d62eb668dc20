import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { AppError } from '../../errors/app-error';
import { parseOrThrow } from '../../errors/validate';
import { idParam } from '../../http/params';
import { actorOf, allow, staff } from '../../middleware/authorise';
import { pagination } from '../../../shared/schemas/common';
import { returningRows } from '../jobs/returning-rows';

const listQuery = z.strictObject({
  ...pagination,
  unread: z.enum(['true', 'false']).optional(),
});

interface NotificationRow {
  id: string;
  kind: string;
  title: string;
  body: string;
  related_kind: string | null;
  related_id: string | null;
  created_at: Date;
  read_at: Date | null;
}

const present = (n: NotificationRow) => ({
  id: n.id,
  kind: n.kind,
  title: n.title,
  body: n.body,
  relatedKind: n.related_kind,
  relatedId: n.related_id,
  createdAt: n.created_at.toISOString(),
  readAt: n.read_at ? n.read_at.toISOString() : null,
});

/** /api/notifications: each staff user's own in-app notices, newest first. */
export function notificationsRouter(db: DataSource) {
  const router = Router();

  router.get('/', allow(...staff), async (req, res) => {
    const actor = actorOf(req);
    const query = parseOrThrow(listQuery, req.query);
    const unreadOnly = query.unread === 'true' ? 'AND read_at IS NULL' : '';
    const rows: NotificationRow[] = await db.query(
      `SELECT id, kind, title, body, related_kind, related_id, created_at, read_at
         FROM notifications WHERE operation_id = $1 AND user_id = $2 ${unreadOnly}
        ORDER BY created_at DESC, id LIMIT $3 OFFSET $4`,
      [actor.operationId, actor.id, query.limit, query.offset],
    );
    const [counts] = await db.query(
      `SELECT count(*)::int AS total, count(*) FILTER (WHERE read_at IS NULL)::int AS unread
         FROM notifications WHERE operation_id = $1 AND user_id = $2 ${unreadOnly}`,
      [actor.operationId, actor.id],
    );
    res.json({ items: rows.map(present), total: counts.total, unread: counts.unread });
  });

  router.post('/:id/read', allow(...staff), async (req, res) => {
    const actor = actorOf(req);
    const rows = returningRows<NotificationRow>(
      await db.query(
        `UPDATE notifications SET read_at = COALESCE(read_at, now())
        WHERE id = $1 AND operation_id = $2 AND user_id = $3
        RETURNING id, kind, title, body, related_kind, related_id, created_at, read_at`,
        [idParam(req), actor.operationId, actor.id],
      ),
    );
    if (!rows[0]) throw AppError.notFound('Notification');
    res.json(present(rows[0]));
  });

  return router;
}

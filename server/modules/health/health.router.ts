import { Router } from 'express';
import type { DataSource } from 'typeorm';

/** GET /api/health: `{ status, db }`, 503 when the database does not answer. */
export function healthRouter(db: DataSource) {
  const router = Router();
  router.get('/', async (_req, res) => {
    try {
      await db.query('SELECT 1');
      res.set('Cache-Control', 'no-store').json({ status: 'ok', db: 'up' });
    } catch {
      res
        .status(503)
        .set({ 'Retry-After': '5', 'Cache-Control': 'no-store' })
        .json({ status: 'unavailable', db: 'down' });
    }
  });
  return router;
}

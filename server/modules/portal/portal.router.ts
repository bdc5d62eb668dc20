import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { actorOf, allow } from '../../middleware/authorise';
import { placementsForGrower } from './placements.service';

/** /api/portal: what only a grower asks for — the colonies on their own blocks. */
export function portalRouter(db: DataSource) {
  const router = Router();
  router.get('/placements', allow('grower'), async (req, res) => {
    res.json({ items: await placementsForGrower(db, actorOf(req)) });
  });
  return router;
}

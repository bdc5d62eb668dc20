import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { parseOrThrow } from '../../errors/validate';
import { actorOf, allow, staff } from '../../middleware/authorise';
import { seasonBoardQuery } from '../../../shared/schemas/moves';
import { seasonBoard } from './season.service';

/** /api/season: the season board's data (staff; crew without money). */
export function seasonRouter(db: DataSource) {
  const router = Router();
  router.get('/', allow(...staff), async (req, res) => {
    const { from, to } = parseOrThrow(seasonBoardQuery, req.query);
    res.json(await seasonBoard(db, actorOf(req), from, to));
  });
  return router;
}

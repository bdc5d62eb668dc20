import { Router } from 'express';
import { listCrops } from '../../../shared/domain/crops';
import { allow, staff } from '../../middleware/authorise';

/** GET /api/crops: each crop's default stocking rate, its range and source. */
export function cropsRouter() {
  const router = Router();
  router.get('/', allow(...staff), (_req, res) => {
    res.json({ items: listCrops() });
  });
  return router;
}

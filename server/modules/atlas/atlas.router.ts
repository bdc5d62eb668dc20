import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { parseOrThrow } from '../../errors/validate';
import { idParam } from '../../http/params';
import { actorOf, allow, planners, staff } from '../../middleware/authorise';
import { atlasQuery, boundaryUploadRequest, dropMoveRequest } from './atlas.schemas';
import { AtlasService } from './atlas.service';
import { SiteBoundaryService } from './site-boundary.service';

/** /api/atlas: the map's summary of the season on a date; staff only (growers get their portal). */
export function atlasRouter(db: DataSource) {
  const service = new AtlasService(db);
  const router = Router();
  router.get('/', allow(...staff), async (req, res) => {
    const query = parseOrThrow(atlasQuery, req.query);
    res.json(await service.summary(actorOf(req), query.on, query.reachKm));
  });
  return router;
}

/**
 * Mounted beside the sites router under /api/sites: `POST /:id/boundary` (a GeoJSON file →
 * boundary, acreage and drops) and `PATCH /:id/drops` (move one drop). Owners and planners.
 */
export function siteBoundaryRouter(db: DataSource) {
  const service = new SiteBoundaryService(db);
  const router = Router();
  router.post('/:id/boundary', allow(...planners), async (req, res) => {
    const id = idParam(req);
    res.json(await service.upload(actorOf(req), id, parseOrThrow(boundaryUploadRequest, req.body)));
  });
  router.patch('/:id/drops', allow(...planners), async (req, res) => {
    const id = idParam(req);
    res.json(await service.moveDrop(actorOf(req), id, parseOrThrow(dropMoveRequest, req.body)));
  });
  return router;
}

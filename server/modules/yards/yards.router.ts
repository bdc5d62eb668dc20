import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { parseOrThrow } from '../../errors/validate';
import { idParam } from '../../http/params';
import { actorOf, allow, planners, staff } from '../../middleware/authorise';
import { archiveRequest } from '../../../shared/schemas/common';
import { yardCreateRequest, yardListQuery, yardUpdateRequest } from '../../../shared/schemas/yards';
import { YardsService } from './yards.service';

/** /api/yards: staff read; owners and planners write. */
export function yardsRouter(db: DataSource) {
  const service = new YardsService(db);
  const router = Router();
  router.get('/', allow(...staff), async (req, res) => {
    res.json(await service.list(actorOf(req), parseOrThrow(yardListQuery, req.query)));
  });
  router.get('/:id', allow(...staff), async (req, res) => {
    res.json(await service.get(actorOf(req), idParam(req)));
  });
  router.post('/', allow(...planners), async (req, res) => {
    res.status(201).json(await service.create(actorOf(req), parseOrThrow(yardCreateRequest, req.body)));
  });
  router.patch('/:id', allow(...planners), async (req, res) => {
    res.json(await service.update(actorOf(req), idParam(req), parseOrThrow(yardUpdateRequest, req.body)));
  });
  router.post('/:id/archive', allow(...planners), async (req, res) => {
    res.json(await service.archive(actorOf(req), idParam(req), parseOrThrow(archiveRequest, req.body).version));
  });
  return router;
}

import type { DataSource } from 'typeorm';
import { parseOrThrow } from '../../errors/validate';
import { resourceRouter } from '../../http/resource-router';
import { idParam } from '../../http/params';
import { actorOf, allow, planners, staff } from '../../middleware/authorise';
import {
  moveCreateRequest,
  moveListQuery,
  moveStatusRequest,
  moveUpdateRequest,
} from '../../../shared/schemas/moves';
import { MovesService } from './moves.service';

/** /api/moves: staff read; owners and planners plan; crew mark loading, rolling, placed. */
export function movesRouter(db: DataSource) {
  const service = new MovesService(db);
  const router = resourceRouter(service, {
    listSchema: moveListQuery,
    createSchema: moveCreateRequest,
    updateSchema: moveUpdateRequest,
    readRoles: staff,
    writeRoles: planners,
  });
  router.post('/:id/status', allow(...staff), async (req, res) => {
    const { version, status } = parseOrThrow(moveStatusRequest, req.body);
    res.json(await service.changeStatus(actorOf(req), idParam(req), version, status));
  });
  return router;
}

import type { DataSource } from 'typeorm';
import { resourceRouter } from '../../http/resource-router';
import { idParam } from '../../http/params';
import { actorOf, allow, planners, staff } from '../../middleware/authorise';
import {
  contractCreateRequest,
  contractListQuery,
  contractUpdateRequest,
} from '../../../shared/schemas/contracts';
import { ContractsService } from './contracts.service';

/** /api/contracts: staff read (crew without money), growers their own; owners and planners write. */
export function contractsRouter(db: DataSource) {
  const service = new ContractsService(db);
  const router = resourceRouter(service, {
    listSchema: contractListQuery,
    createSchema: contractCreateRequest,
    updateSchema: contractUpdateRequest,
    readRoles: [...staff, 'grower'],
    writeRoles: planners,
  });
  router.get('/:id/history', allow(...planners, 'grower'), async (req, res) => {
    res.json(await service.history(actorOf(req), idParam(req)));
  });
  return router;
}

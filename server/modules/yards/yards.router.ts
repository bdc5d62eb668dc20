import type { DataSource } from 'typeorm';
import { resourceRouter } from '../../http/resource-router';
import { planners, staff } from '../../middleware/authorise';
import { yardCreateRequest, yardListQuery, yardUpdateRequest } from '../../../shared/schemas/yards';
import { YardsService } from './yards.service';

/** /api/yards: staff read; owners and planners write. */
export function yardsRouter(db: DataSource) {
  return resourceRouter(new YardsService(db), {
    listSchema: yardListQuery,
    createSchema: yardCreateRequest,
    updateSchema: yardUpdateRequest,
    readRoles: staff,
    writeRoles: planners,
  });
}

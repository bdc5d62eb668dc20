import type { DataSource } from 'typeorm';
import { resourceRouter } from '../../http/resource-router';
import { planners, staff } from '../../middleware/authorise';
import {
  growerCreateRequest,
  growerListQuery,
  growerUpdateRequest,
} from '../../../shared/schemas/growers';
import { GrowersService } from './growers.service';

/** /api/growers: staff read all; a grower reads only their own; owners and planners write. */
export function growersRouter(db: DataSource) {
  return resourceRouter(new GrowersService(db), {
    listSchema: growerListQuery,
    createSchema: growerCreateRequest,
    updateSchema: growerUpdateRequest,
    readRoles: [...staff, 'grower'],
    writeRoles: planners,
  });
}

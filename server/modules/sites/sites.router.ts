import type { DataSource } from 'typeorm';
import { resourceRouter } from '../../http/resource-router';
import { planners, staff } from '../../middleware/authorise';
import { siteCreateRequest, siteListQuery, siteUpdateRequest } from '../../../shared/schemas/sites';
import { SitesService } from './sites.service';

/** /api/sites: staff read all; a grower reads their own; owners and planners write. */
export function sitesRouter(db: DataSource) {
  return resourceRouter(new SitesService(db), {
    listSchema: siteListQuery,
    createSchema: siteCreateRequest,
    updateSchema: siteUpdateRequest,
    readRoles: [...staff, 'grower'],
    writeRoles: planners,
  });
}

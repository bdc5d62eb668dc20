import type { DataSource } from 'typeorm';
import { TenantRepository } from '../../db/tenant-repository';
import { simpleResourceRouter } from '../../http/simple-resource';
import { isoOrNull } from '../../http/present';
import { planners, staff } from '../../middleware/authorise';
import {
  hiveSetupCreateRequest,
  hiveSetupListQuery,
  hiveSetupUpdateRequest,
} from '../../../shared/schemas/hive-setups';
import { HiveSetup } from './hive-setup.entity';

export const hiveSetups = new TenantRepository(HiveSetup, 'Hive setup');

/** /api/hive-setups: box stacks and their honey fill. */
export function hiveSetupsRouter(db: DataSource) {
  return simpleResourceRouter(db, {
    repository: hiveSetups,
    createSchema: hiveSetupCreateRequest,
    updateSchema: hiveSetupUpdateRequest,
    listSchema: hiveSetupListQuery,
    readRoles: staff,
    writeRoles: planners,
    present: (s) => ({
      id: s.id,
      name: s.name,
      boxes: s.boxes,
      version: s.version,
      archivedAt: isoOrNull(s.archivedAt),
    }),
  });
}

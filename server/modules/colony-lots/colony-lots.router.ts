import type { DataSource } from 'typeorm';
import { TenantRepository } from '../../db/tenant-repository';
import { simpleResourceRouter } from '../../http/simple-resource';
import { isoOrNull } from '../../http/present';
import { planners, staff } from '../../middleware/authorise';
import {
  colonyLotCreateRequest,
  colonyLotListQuery,
  colonyLotUpdateRequest,
} from '../../../shared/schemas/colony-lots';
import { ColonyLot } from './colony-lot.entity';
import { hiveSetups } from '../hive-setups/hive-setups.router';

export const colonyLots = new TenantRepository(ColonyLot, 'Colony lot');

/** /api/colony-lots: groups of colonies kept alike; their counts are in the ledger. */
export function colonyLotsRouter(db: DataSource) {
  return simpleResourceRouter(db, {
    repository: colonyLots,
    createSchema: colonyLotCreateRequest,
    updateSchema: colonyLotUpdateRequest,
    listSchema: colonyLotListQuery,
    references: [{ field: 'hiveSetupId', repository: hiveSetups as never }],
    readRoles: staff,
    writeRoles: planners,
    present: (l) => ({
      id: l.id,
      name: l.name,
      hiveSetupId: l.hiveSetupId,
      coloniesPerPallet: l.coloniesPerPallet,
      queenStatus: l.queenStatus,
      meanFrames: l.meanFrames,
      notes: l.notes,
      version: l.version,
      archivedAt: isoOrNull(l.archivedAt),
    }),
  });
}

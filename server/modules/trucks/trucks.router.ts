import type { DataSource } from 'typeorm';
import { TenantRepository } from '../../db/tenant-repository';
import { simpleResourceRouter } from '../../http/simple-resource';
import { isoOrNull } from '../../http/present';
import { staff } from '../../middleware/authorise';
import {
  truckCreateRequest,
  truckListQuery,
  truckUpdateRequest,
} from '../../../shared/schemas/trucks';
import { Truck } from './truck.entity';

export const trucks = new TenantRepository(Truck, 'Truck');

/** /api/trucks: the fleet. Staff read it; the owner keeps it. */
export function trucksRouter(db: DataSource) {
  return simpleResourceRouter(db, {
    repository: trucks,
    createSchema: truckCreateRequest,
    updateSchema: truckUpdateRequest,
    listSchema: truckListQuery,
    readRoles: staff,
    writeRoles: ['owner'],
    present: (t) => ({
      id: t.id,
      name: t.name,
      payloadKg: t.payloadKg,
      palletSpots: t.palletSpots,
      tiers: t.tiers,
      tareKg: t.tareKg,
      legalGrossKg: t.legalGrossKg,
      notes: t.notes,
      version: t.version,
      archivedAt: isoOrNull(t.archivedAt),
    }),
  });
}

import type { HiveBox } from '@shared/schemas/hive-setups';
import type { queenStatuses } from '@shared/schemas/colony-lots';
import type { Role, Units } from '@shared/schemas/users';

/** A truck as the API presents it (SI units). */
export interface Truck {
  id: string;
  name: string;
  payloadKg: number;
  palletSpots: number;
  tiers: number;
  tareKg: number;
  legalGrossKg: number;
  notes: string;
  version: number;
  archivedAt: string | null;
}

/** A hive setup: the stack of boxes and their honey fill. */
export interface HiveSetup {
  id: string;
  name: string;
  boxes: HiveBox[];
  version: number;
  archivedAt: string | null;
}

/** A colony lot: colonies kept alike; counts are in the ledger. */
export interface ColonyLot {
  id: string;
  name: string;
  hiveSetupId: string;
  coloniesPerPallet: number;
  queenStatus: (typeof queenStatuses)[number];
  meanFrames: number | null;
  notes: string;
  version: number;
  archivedAt: string | null;
}

/** A person of the operation, as the owner sees them. */
export interface Person {
  id: string;
  email: string;
  name: string;
  role: Role;
  growerId: string | null;
  units: Units;
  active: boolean;
  version: number;
}

/** A crop and its default stocking rate (GET /api/crops). */
export interface CropRate {
  key: string;
  name: string;
  hivesPerAcre: number | null;
  range: { min: number; max: number } | null;
  source: string;
}

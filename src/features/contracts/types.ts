import type { ContractStatus } from '@shared/schemas/contracts';
import type { CropKey } from '@shared/schemas/sites';

/** A contract as the API presents it; money fields are absent for crew. */
export interface Contract {
  id: string;
  growerId: string;
  siteIds: string[];
  crop: CropKey;
  season: number;
  status: ContractStatus;
  coloniesOrdered: number;
  minFrames: number;
  averageFrames: number | null;
  feePerColonyCents?: number;
  depositCents?: number;
  frameAdjustmentCents?: number;
  deliveryStartOn: string;
  deliveryEndOn: string;
  removalOn: string | null;
  sprayNoticeHours: number | null;
  terms: string;
  internalNotes?: string;
  version: number;
  archivedAt: string | null;
}

export interface ContractFilters {
  status?: ContractStatus;
  crop?: CropKey;
  season?: number;
  growerId?: string;
}

/** One event of a contract's history. */
export interface ContractEvent {
  id: string;
  kind: string;
  detail: Record<string, unknown>;
  occurredAt: string;
}

export const statusLabels: Record<ContractStatus, string> = {
  draft: 'Draft',
  offered: 'Offered to grower',
  agreed: 'Agreed',
  'turned-down': 'Turned down',
  'in-bloom': 'In bloom',
  released: 'Released',
  settled: 'Settled',
  withdrawn: 'Withdrawn',
};

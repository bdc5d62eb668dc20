import type { LoadRecord, MoveStatus } from '@shared/schemas/moves';
export type { DropPlacement, LoadRecord } from '@shared/schemas/moves';

// The plan's shape is shared with the server that builds it.
import type { PlanOrigin, PlanTimeline, PlanTotals, PlannedTruck } from '@shared/schemas/move-plan';
import type { MoveCaution, MoveWarning } from '@shared/domain/move-warnings';
export type {
  MovePlan,
  OriginDusk,
  PlanOrigin,
  PlanTimeline,
  PlanTotals,
  PlannedPickup,
  PlannedStop,
  PlannedTruck,
  WeightSource,
} from '@shared/schemas/move-plan';
export type { MoveLeg, MoveWindow } from '@shared/domain/move-window';
export type { MoveCaution, MoveWarning, WarningSeverity } from '@shared/domain/move-warnings';

/** One truck's load of a saved move, with what the crew recorded. */
export interface MoveLoad extends LoadRecord {
  id: string;
  truckId: string;
  position: number;
  driverNames: string[];
  palletsPlanned: number | null;
  coloniesPlanned: number | null;
  plan: PlannedTruck | null;
}

/** The plan a saved move keeps (move.timeline). */
export interface StoredPlan {
  computedAt: string;
  timeline: PlanTimeline;
  origins: PlanOrigin[];
  totals: PlanTotals;
  palletTareKg: number;
  warnings: MoveWarning[];
  cautions: MoveCaution[];
  assumptions: string[];
}

/** A move as the API presents it. */
export interface Move {
  id: string;
  name: string;
  nightOf: string;
  status: MoveStatus;
  destinationKind: 'yard' | 'site';
  destinationIds: string[];
  contractId: string | null;
  drivers: 1 | 2;
  loadingMinutes: number;
  averageSpeedKmh: number;
  timeline: StoredPlan | null;
  notes: string;
  origins: Array<{ yardId: string; lotId: string; colonies: number; pickupOrder: number }>;
  loads: MoveLoad[];
  version: number;
  archivedAt: string | null;
}

/** Colonies of one lot at one yard on a night (GET /api/moves/availability). */
export interface AvailabilityItem {
  yardId: string;
  yardName: string;
  lotId: string;
  lotName: string;
  inLedger: number;
  canLeave: number;
  promised: number;
  free: number;
  promisedTo: Array<{
    moveId: string;
    moveName: string;
    nightOf: string;
    status: MoveStatus;
    colonies: number;
  }>;
}

export interface Availability {
  nightOf: string;
  items: AvailabilityItem[];
}

// The load sheet's shape is shared with the server that builds it.
export type {
  LoadSheet,
  LoadSheetContract,
  LoadSheetDestination,
  LoadSheetPage,
  LoadSheetStop,
} from '@shared/schemas/load-sheet';

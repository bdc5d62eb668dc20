import type { LoadRecord, MoveStatus } from '@shared/schemas/moves';
export type { DropPlacement, LoadRecord } from '@shared/schemas/moves';

// The plan's shape is shared with the server that builds it.
import type {
  PlanOrigin,
  PlanTimeline,
  PlanTotals,
  PlannedStop,
  PlannedTruck,
} from '@shared/schemas/move-plan';
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

export interface LoadSheetStop extends PlannedStop {
  latitude: number;
  longitude: number;
  accessNotes: string;
  timeZone: string;
  civilDusk: string | null;
}

export interface LoadSheetPage extends Omit<PlannedTruck, 'stops'> {
  page: number;
  loadId: string;
  stops: LoadSheetStop[];
  recorded: LoadRecord;
}

export interface LoadSheetDestination {
  kind: 'yard' | 'site';
  id: string;
  name: string;
  latitude: number | null;
  longitude: number | null;
  accessNotes: string;
  crop: string | null;
  dropMap: { siteId: string; drops: number } | null;
  grower: {
    id: string;
    name: string;
    contacts: Array<{ name: string; phone: string | null; title: string | null }>;
  } | null;
}

/** GET /api/moves/:id/load-sheet: printable pages, one per truck. */
export interface LoadSheet {
  move: {
    id: string;
    name: string;
    nightOf: string;
    status: MoveStatus;
    drivers: 1 | 2;
    loadingMinutes: number;
    averageSpeedKmh: number;
    notes: string;
    version: number;
  };
  planSource: 'saved' | 'computed-now';
  computedAt: string | null;
  contract: {
    id: string;
    crop: string;
    status: string;
    coloniesOrdered: number;
    minFrames: number;
    averageFrames: number | null;
    deliveryStartOn: string;
    deliveryEndOn: string;
  } | null;
  destinations: LoadSheetDestination[];
  timeline: PlanTimeline;
  totals: PlanTotals;
  palletTareKg: number;
  pages: LoadSheetPage[];
  warnings: MoveWarning[];
  cautions: MoveCaution[];
  assumptions: string[];
}

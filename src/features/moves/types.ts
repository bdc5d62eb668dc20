import type { MoveStatus, PreRollCheck, StopPalletCount } from '@shared/schemas/moves';

/** Where a hive weight came from (a weighing, or computed from the hive setup). */
export interface WeightSource {
  kind: string;
  sampledOn?: string;
}

/** One pick-up on a truck's route. */
export interface PlannedStop {
  pickupOrder: number;
  yardId: string;
  yardName: string;
  lotId: string;
  lotName: string;
  pallets: number;
  colonies: number;
}

/** One truck of the load sheet (POST /api/moves/preview, docs/moves.md). */
/** A pick-up yard on a truck's way, with the drive from the yard before (none for the first). */
export interface PlannedPickup {
  yardId: string;
  yardName: string;
  timeZone: string;
  driveKm: number;
  driveMinutes: number;
  loadingStart: string;
}

export interface PlannedTruck {
  key: string;
  truckId: string;
  truckName: string;
  driverNames: string[];
  payloadKg: number;
  palletSpots: number;
  tiers: number;
  tareKg: number;
  pallets: number;
  colonies: number;
  weightKg: number;
  weightUpperKg: number;
  payloadUsedPercent: number;
  payloadUsedUpperPercent: number;
  gross: { grossKg: number; legalGrossKg: number; marginKg: number; withinLimit: boolean };
  stops: PlannedStop[];
  /** Absent in plans saved before pick-ups were routed. */
  pickups?: PlannedPickup[];
  departure: string | null;
  arrival: string | null;
  civilDawn: string | null;
  arrivesBeforeDawn: boolean | null;
  arrivesInDarkness: boolean | null;
}

/** One leg of the haul, written in the zone where the truck is. */
export interface MoveLeg {
  kind: 'drive' | 'rest';
  start: string;
  end: string;
  minutes: number;
  distanceKm?: number;
  driver?: number;
}

/** The move's timeline from the first pick-up yard to the first destination. */
export interface MoveWindow {
  origin: { timeZone: string; sunset: string | null; civilDusk: string | null };
  destination: { timeZone: string; civilDawn: string | null; sunrise: string | null };
  loadingStart: string;
  departure: string;
  arrival: string;
  distanceKm: number;
  driveMinutes: number;
  restMinutes: number;
  arrivesBeforeDawn: boolean | null;
  latestDepartureForDawn: string | null;
  legs: MoveLeg[];
  notes: string[];
}

export interface OriginDusk {
  yardId: string;
  yardName: string;
  timeZone: string;
  sunset: string | null;
  civilDusk: string | null;
}

export interface PlanTimeline {
  from: { yardId: string; yardName: string } | null;
  to: { kind: 'yard' | 'site'; id: string; name: string } | null;
  window: MoveWindow | null;
  /** Absent in plans saved before pick-ups were routed. */
  pickups?: PlannedPickup[];
  arrivesInDarkness: boolean | null;
  originDusk: OriginDusk[];
}

export type WarningSeverity = 'danger' | 'warning' | 'info';

export interface MoveWarning {
  code: string;
  severity: WarningSeverity;
  message: string;
  truckKey?: string;
}

export interface MoveCaution {
  code: string;
  message: string;
}

export interface PlanOrigin {
  pickupOrder: number;
  yardId: string;
  yardName: string;
  lotId: string;
  lotName: string;
  colonies: number;
  coloniesPerPallet: number;
  loadedColonies: number;
  leftBehindColonies: number;
  freeColonies: number;
  hiveWeightKg: { mean: number; sd: number; samples: number; source: WeightSource };
  meanFrames: number | null;
}

export interface PlanTotals {
  colonies: number;
  loadedColonies: number;
  leftBehindColonies: number;
  pallets: number;
  weightKg: number;
  weightUpperKg: number;
  trucksUsed: number;
}

/** The whole plan: what the preview answers and a saved move keeps. */
export interface MovePlan {
  nightOf: string;
  loadSheet: {
    palletTareKg: number;
    trucks: PlannedTruck[];
    origins: PlanOrigin[];
    totals: PlanTotals;
  };
  timeline: PlanTimeline;
  warnings: MoveWarning[];
  cautions: MoveCaution[];
  assumptions: string[];
}

export interface DropPlacement {
  placeId: string;
  drop?: string;
  colonies: number;
}

/** One truck's load of a saved move, with what the crew recorded. */
export interface MoveLoad {
  id: string;
  truckId: string;
  position: number;
  driverNames: string[];
  palletsPlanned: number | null;
  coloniesPlanned: number | null;
  plan: PlannedTruck | null;
  palletsLoaded: number | null;
  palletsByStop: StopPalletCount[] | null;
  coloniesPlaced: number | null;
  coloniesLeftBehind: number | null;
  coloniesLost: number | null;
  placements: DropPlacement[] | null;
  preRollCheck: PreRollCheck | null;
  notes: string;
  version: number;
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
  recorded: {
    palletsLoaded: number | null;
    palletsByStop: StopPalletCount[] | null;
    coloniesPlaced: number | null;
    coloniesLeftBehind: number | null;
    coloniesLost: number | null;
    placements: DropPlacement[] | null;
    preRollCheck: PreRollCheck | null;
    notes: string;
    version: number;
  };
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

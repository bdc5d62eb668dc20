/**
 * The shape of a move's plan (POST /api/moves/preview, a saved move's plan, its load sheet):
 * built by server/modules/moves/move-plan.ts, read by the move screens. Types only.
 */
import type { HiveWeightStats } from '../domain/load-weight';
import type { MoveCaution, MoveWarning } from '../domain/move-warnings';
import type { MoveWindow } from '../domain/move-window';
import type { GrossWeightCheck } from '../domain/road-weight-limits';

/** Where a lot's hive weight came from. */
export type WeightSource =
  | { kind: 'yard-sample'; sampledOn: string }
  | { kind: 'lot-sample'; sampledOn: string; yardId: string | null }
  | { kind: 'hive-setup'; hiveSetupName: string };

/** Where a lot's strength came from. */
export type StrengthSource =
  | { kind: 'strength-sample'; sampledOn: string; samples: number }
  | { kind: 'lot' }
  | { kind: 'unknown' };

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

/** One truck's page of the load sheet. */
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
  /** Expected load ÷ payload, %. */
  payloadUsedPercent: number;
  /** Upper-bound load ÷ payload, %. */
  payloadUsedUpperPercent: number;
  /** Tare + upper-bound load against the legal gross. */
  gross: GrossWeightCheck;
  stops: PlannedStop[];
  /**
   * The yards it calls at in order, with the drives between them (empty when it carries nothing).
   * Absent in plans saved before pick-ups were routed.
   */
  pickups?: PlannedPickup[];
  /** This truck's own haul from its last pick-up yard (null when it carries nothing). */
  departure: string | null;
  arrival: string | null;
  /** Civil dawn at the destination after this truck departs. */
  civilDawn: string | null;
  arrivesBeforeDawn: boolean | null;
  /** Arrival between civil dusk and civil dawn of its local night (a later night counts too). */
  arrivesInDarkness: boolean | null;
}

/**
 * One pick-up yard on a truck's way: loading there starts at `loadingStart` (the yard's zone),
 * after the drive from the yard before (none for the first, where loading starts at dusk).
 */
export interface PlannedPickup {
  yardId: string;
  yardName: string;
  timeZone: string;
  /** From the yard before: road km (great circle × road factor) and minutes at the average speed. */
  driveKm: number;
  driveMinutes: number;
  loadingStart: string;
}

/** Dusk at one origin yard, in that yard's zone. */
export interface OriginDusk {
  yardId: string;
  yardName: string;
  timeZone: string;
  sunset: string | null;
  civilDusk: string | null;
}

/** One origin on the load sheet: what was asked of a lot at a yard and what the trucks take. */
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
  hiveWeightKg: HiveWeightStats & { source: WeightSource };
  meanFrames: number | null;
  strengthSource: StrengthSource;
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

export interface PlanTimeline {
  from: { yardId: string; yardName: string } | null;
  to: { kind: 'yard' | 'site'; id: string; name: string } | null;
  /** The first loaded truck's haul (or, with no truck, the first origin's). */
  window: MoveWindow | null;
  /**
   * That truck's pick-up yards: loading at the first, then a drive and loading at each next.
   * Absent in plans saved before pick-ups were routed.
   */
  pickups?: PlannedPickup[];
  /** Whether that haul arrives in the dark (see arrivesInDarkness in move-plan.ts). */
  arrivesInDarkness: boolean | null;
  originDusk: OriginDusk[];
}

/** The whole plan: what the preview returns and a saved move keeps. */
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

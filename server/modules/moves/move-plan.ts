/**
 * A move's plan from gathered facts, without I/O: the load sheet (planNightLoads), the timeline
 * (computeMoveWindow), and the warnings and cautions (move-warnings.ts). The preview endpoint, the
 * saved plan of a move, its printable load sheet and the benchmark all go through buildMovePlan.
 */
import { planNightLoads } from '../../../shared/domain/load-plan';
import type { HiveWeightStats } from '../../../shared/domain/load-weight';
import { greatCircleDistanceKm } from '../../../shared/domain/distance';
import {
  computeMoveWindow,
  DEFAULT_ROAD_FACTOR,
  type MoveWindow,
} from '../../../shared/domain/move-window';
import {
  moveCautions,
  moveWarnings,
  type ContractFacts,
} from '../../../shared/domain/move-warnings';
import { grossWeightCheck } from '../../../shared/domain/road-weight-limits';
import { sunEventsAt } from '../../../shared/domain/sun';
import type {
  MovePlan,
  PlannedPickup,
  PlannedStop,
  PlannedTruck,
  OriginDusk,
  StrengthSource,
  WeightSource,
} from '../../../shared/schemas/move-plan';
import { formatInstantInZone, localDateAt, timeZoneAt } from '../../../shared/domain/time-zones';

/** Empty 4-way migratory pallet, kg: about 20 kg [memory]; used until the fleet records its own. */
export const DEFAULT_PALLET_TARE_KG = 20;
/**
 * Spread assumed for a hive weight computed from the box setup: 10 % of the mean [memory], taken
 * as if 2 hives had been weighed (the fewest the 95 % bound accepts with a spread), so an unweighed
 * lot is planned with a wide margin rather than none.
 */
export const ASSUMED_WEIGHT_SD_SHARE = 0.1;
export const ASSUMED_WEIGHT_SAMPLES = 2;
/** Loading time and speed when a move does not say (the moves table's defaults). */
export const DEFAULT_LOADING_MINUTES = 90;
export const DEFAULT_AVERAGE_SPEED_KMH = 80;

/** One origin: colonies of one lot picked up at one yard. */
export interface OriginFact {
  pickupOrder: number;
  yardId: string;
  yardName: string;
  latitude: number;
  longitude: number;
  lotId: string;
  lotName: string;
  colonies: number;
  coloniesPerPallet: number;
  hiveWeightKg: HiveWeightStats;
  weightSource: WeightSource;
  meanFrames: number | null;
  strengthSource: StrengthSource;
  /** Free colonies of this lot at this yard that night (ledger less other moves' promises). */
  freeColonies: number;
}

/** One truck of the night, in the order it is filled. */
export interface TruckFact {
  /** Position in the move's loads (`load-0`, …): the same truck may not be listed twice. */
  key: string;
  truckId: string;
  name: string;
  driverNames: string[];
  payloadKg: number;
  palletSpots: number;
  tiers: number;
  tareKg: number;
  legalGrossKg: number;
}

/** A destination place. */
export interface DestinationFact {
  kind: 'yard' | 'site';
  id: string;
  name: string;
  latitude: number;
  longitude: number;
}

/** Everything buildMovePlan needs. */
export interface PlanFacts {
  nightOf: string;
  drivers: 1 | 2;
  loadingMinutes: number;
  averageSpeedKmh: number;
  palletTareKg: number;
  origins: OriginFact[];
  trucks: TruckFact[];
  destinations: DestinationFact[];
  contract: (ContractFacts & { id: string }) | null;
}

const round1 = (value: number) => Math.round(value * 10) / 10;

function iso(instant: Date | null, timeZone: string): string | null {
  return instant ? formatInstantInZone(instant, timeZone) : null;
}

/**
 * Whether an arrival falls in the dark at the destination: before civil dawn or after civil dusk
 * of its own local date. A multi-night haul that rolls in at 03:00 on the second night is in the
 * dark even though it is after the first dawn. Null where the Sun does not reach −6°.
 */
function arrivesInDarkness(window: MoveWindow, place: DestinationFact): boolean | null {
  const arrival = new Date(window.arrival);
  const zone = window.destination.timeZone;
  const sun = sunEventsAt(place.latitude, place.longitude, localDateAt(arrival, zone), zone);
  if (!sun.civilDawn || !sun.civilDusk) return null;
  return arrival < sun.civilDawn || arrival > sun.civilDusk;
}

/** Builds the load sheet, timeline, warnings and cautions of a move from its facts. */
export function buildMovePlan(facts: PlanFacts): MovePlan {
  const assumptions: string[] = [
    `Pallet tare ${facts.palletTareKg} kg (a 4-way migratory pallet, about 20 kg [memory]).`,
    'Trucks are filled in the order listed and yards visited in pick-up order; each truck is planned against the 95 % upper bound of its load.',
  ];
  const origins = facts.origins;
  const night = planNightLoads({
    yards: origins.map((o, i) => ({
      yardId: String(i),
      colonies: o.colonies,
      hiveWeightKg: o.hiveWeightKg,
      coloniesPerPallet: o.coloniesPerPallet,
    })),
    coloniesPerPallet: origins[0]?.coloniesPerPallet ?? 4,
    palletTareKg: facts.palletTareKg,
    trucks: facts.trucks.map((t) => ({
      id: t.key,
      payloadKg: t.payloadKg,
      palletSpots: t.palletSpots,
      tiers: t.tiers,
    })),
  });
  for (const o of origins) {
    if (o.weightSource.kind === 'hive-setup') {
      assumptions.push(
        `${o.lotName} at ${o.yardName}: no weighed hives, so the weight is computed from the box setup "${o.weightSource.hiveSetupName}" (${round1(o.hiveWeightKg.mean)} kg) with a spread of ${ASSUMED_WEIGHT_SD_SHARE * 100} % of the mean taken as ${ASSUMED_WEIGHT_SAMPLES} weighings.`,
      );
    } else if (o.weightSource.kind === 'lot-sample') {
      assumptions.push(
        `${o.lotName} at ${o.yardName}: weights from the lot's latest weighing elsewhere (${o.weightSource.sampledOn}).`,
      );
    }
  }

  const destination = facts.destinations[0] ?? null;
  const windows = new Map<number, MoveWindow | null>();
  /** The haul from origin `index`'s yard to the first destination (memoised per yard position). */
  const windowFrom = (index: number): MoveWindow | null => {
    if (!destination || !origins[index]) return null;
    const cached = windows.get(index);
    if (cached !== undefined) return cached;
    const o = origins[index];
    const window = computeMoveWindow({
      origin: { lat: o.latitude, lon: o.longitude },
      destination: { lat: destination.latitude, lon: destination.longitude },
      date: facts.nightOf,
      loadingMinutes: facts.loadingMinutes,
      averageSpeedKmh: facts.averageSpeedKmh,
      drivers: facts.drivers,
    });
    for (const [i, other] of origins.entries())
      if (other.yardId === o.yardId) windows.set(i, window);
    return window;
  };
  /**
   * A truck's haul through its pick-up yards (origin positions, in pick-up order): loading starts
   * at dusk at the first yard; it drives to each next yard and loads there; the haul to the
   * destination leaves from the last one.
   */
  const haulThrough = (
    positions: number[],
  ): { window: MoveWindow | null; pickups: PlannedPickup[] } => {
    const yards = positions.filter(
      (p, i) => positions.findIndex((q) => origins[q].yardId === origins[p].yardId) === i,
    );
    const first = yards.length ? windowFrom(yards[0]) : null;
    if (!first) return { window: null, pickups: [] };
    const pickups: PlannedPickup[] = [];
    let loadingStart = new Date(first.loadingStart);
    for (const [i, position] of yards.entries()) {
      const o = origins[position];
      const timeZone = timeZoneAt(o.latitude, o.longitude);
      let driveKm = 0;
      let driveMinutes = 0;
      if (i > 0) {
        const before = origins[yards[i - 1]];
        driveKm =
          greatCircleDistanceKm(
            { lat: before.latitude, lon: before.longitude },
            { lat: o.latitude, lon: o.longitude },
          ) * DEFAULT_ROAD_FACTOR;
        driveMinutes = (driveKm / facts.averageSpeedKmh) * 60;
        loadingStart = new Date(
          loadingStart.getTime() + (facts.loadingMinutes + driveMinutes) * 60_000,
        );
      }
      pickups.push({
        yardId: o.yardId,
        yardName: o.yardName,
        timeZone,
        driveKm: round1(driveKm),
        driveMinutes: Math.round(driveMinutes),
        loadingStart: formatInstantInZone(loadingStart, timeZone),
      });
    }
    if (yards.length === 1) return { window: first, pickups };
    const last = origins[yards[yards.length - 1]];
    const window = computeMoveWindow({
      origin: { lat: last.latitude, lon: last.longitude },
      destination: { lat: destination!.latitude, lon: destination!.longitude },
      date: facts.nightOf,
      loadingStart: loadingStart.toISOString(),
      loadingMinutes: facts.loadingMinutes,
      averageSpeedKmh: facts.averageSpeedKmh,
      drivers: facts.drivers,
    });
    return { window, pickups };
  };
  if (facts.destinations.length > 1) {
    assumptions.push(
      `The timeline runs to the first destination (${destination?.name}); the other ${facts.destinations.length - 1} are close by.`,
    );
  }
  if (new Set(origins.map((o) => o.yardId)).size > 1) {
    assumptions.push(
      `A truck calling at several yards loads at each for the loading time and drives between them at the average speed over the great-circle distance × ${DEFAULT_ROAD_FACTOR}; that driving is not counted against the drivers' hours.`,
    );
  }

  const hauls = night.trucks.map((load) =>
    haulThrough(load.stops.map((stop) => Number(stop.yardId))),
  );
  const trucks: PlannedTruck[] = night.trucks.map((load, i) => {
    const truck = facts.trucks[i];
    const stops: PlannedStop[] = load.stops.map((stop) => {
      const o = origins[Number(stop.yardId)];
      return {
        pickupOrder: o.pickupOrder,
        yardId: o.yardId,
        yardName: o.yardName,
        lotId: o.lotId,
        lotName: o.lotName,
        pallets: stop.pallets,
        colonies: stop.colonies,
      };
    });
    const { window, pickups } = hauls[i];
    return {
      key: truck.key,
      truckId: truck.truckId,
      truckName: truck.name,
      driverNames: truck.driverNames,
      payloadKg: truck.payloadKg,
      palletSpots: truck.palletSpots,
      tiers: truck.tiers,
      tareKg: truck.tareKg,
      pallets: load.pallets,
      colonies: load.colonies,
      weightKg: round1(load.weightKg),
      weightUpperKg: round1(load.weightUpperKg),
      payloadUsedPercent: round1((load.weightKg / truck.payloadKg) * 100),
      payloadUsedUpperPercent: round1((load.weightUpperKg / truck.payloadKg) * 100),
      gross: grossWeightCheck({
        truckTareKg: truck.tareKg,
        loadKg: load.weightUpperKg,
        legalGrossKg: truck.legalGrossKg,
      }),
      stops,
      pickups,
      departure: window?.departure ?? null,
      arrival: window?.arrival ?? null,
      civilDawn: window?.destination.civilDawn ?? null,
      arrivesBeforeDawn: window?.arrivesBeforeDawn ?? null,
      arrivesInDarkness: window && destination ? arrivesInDarkness(window, destination) : null,
    };
  });

  const originDusk: OriginDusk[] = [];
  for (const o of origins) {
    if (originDusk.some((d) => d.yardId === o.yardId)) continue;
    const timeZone = timeZoneAt(o.latitude, o.longitude);
    const sun = sunEventsAt(o.latitude, o.longitude, facts.nightOf, timeZone);
    originDusk.push({
      yardId: o.yardId,
      yardName: o.yardName,
      timeZone,
      sunset: iso(sun.sunset, timeZone),
      civilDusk: iso(sun.civilDusk, timeZone),
    });
  }

  // The timeline shows the first truck that carries colonies; with none, the first origin's haul.
  const firstLoaded = night.trucks.findIndex((load) => load.stops.length > 0);
  const main = firstLoaded >= 0 ? hauls[firstLoaded] : haulThrough(origins.length ? [0] : []);
  const mainWindow = main.window;

  const sumOf = (pick: (t: PlannedTruck) => number) => trucks.reduce((s, t) => s + pick(t), 0);
  const warnings = moveWarnings({
    trucks: trucks.map((t) => ({
      key: t.key,
      name: t.truckName,
      colonies: t.colonies,
      weightUpperKg: t.weightUpperKg,
      payloadKg: t.payloadKg,
      grossKg: t.gross.grossKg,
      legalGrossKg: t.gross.legalGrossKg,
      arrivesBeforeDawn: t.colonies > 0 ? t.arrivesBeforeDawn : null,
      arrivesInDarkness: t.arrivesInDarkness,
      arrival: t.arrival,
      civilDawn: t.civilDawn,
    })),
    origins: origins.map((o) => ({
      yardId: o.yardId,
      yardName: o.yardName,
      lotId: o.lotId,
      lotName: o.lotName,
      colonies: o.colonies,
      freeColonies: o.freeColonies,
      meanFrames: o.meanFrames,
      weightAssumed: o.weightSource.kind === 'hive-setup',
    })),
    unassignedColonies: night.unassignedColonies,
    contract: facts.contract,
  });
  const cautions = moveCautions({
    nightOf: facts.nightOf,
    latitudes: [...origins.map((o) => o.latitude), ...facts.destinations.map((d) => d.latitude)],
  });

  return {
    nightOf: facts.nightOf,
    loadSheet: {
      palletTareKg: facts.palletTareKg,
      trucks,
      origins: origins.map((o, i) => ({
        pickupOrder: o.pickupOrder,
        yardId: o.yardId,
        yardName: o.yardName,
        lotId: o.lotId,
        lotName: o.lotName,
        colonies: o.colonies,
        coloniesPerPallet: o.coloniesPerPallet,
        loadedColonies: night.yards[i].loadedColonies,
        leftBehindColonies: night.yards[i].unassignedColonies,
        freeColonies: o.freeColonies,
        hiveWeightKg: {
          mean: round1(o.hiveWeightKg.mean),
          sd: round1(o.hiveWeightKg.sd),
          samples: o.hiveWeightKg.samples,
          source: o.weightSource,
        },
        meanFrames: o.meanFrames === null ? null : round1(o.meanFrames),
        strengthSource: o.strengthSource,
      })),
      totals: {
        colonies: origins.reduce((s, o) => s + o.colonies, 0),
        loadedColonies: sumOf((t) => t.colonies),
        leftBehindColonies: night.unassignedColonies,
        pallets: sumOf((t) => t.pallets),
        weightKg: round1(sumOf((t) => t.weightKg)),
        weightUpperKg: round1(sumOf((t) => t.weightUpperKg)),
        trucksUsed: night.trucksUsed,
      },
    },
    timeline: {
      from: main.pickups[0]
        ? { yardId: main.pickups[0].yardId, yardName: main.pickups[0].yardName }
        : origins[0]
          ? { yardId: origins[0].yardId, yardName: origins[0].yardName }
          : null,
      to: destination
        ? { kind: destination.kind, id: destination.id, name: destination.name }
        : null,
      window: mainWindow,
      pickups: main.pickups,
      arrivesInDarkness:
        mainWindow && destination ? arrivesInDarkness(mainWindow, destination) : null,
      originDusk,
    },
    warnings,
    cautions,
    assumptions,
  };
}

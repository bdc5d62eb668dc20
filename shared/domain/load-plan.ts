/**
 * Load plan: colonies → pallets → trucks, against each truck's payload, pallet spots and tiers,
 * for one origin (computeLoadPlan, the API contract) or several yards in one night (planNightLoads).
 *
 * Model and decisions (docs/calculations.md):
 * - Colonies live on pallets of `coloniesPerPallet`; only a yard's last pallet may be partial.
 *   Trucks take whole pallets.
 * - A truck is filled against the one-sided 95 % upper prediction bound of its load (load-weight.ts),
 *   never against the expected weight.
 * - Trucks are filled in the order given (first fit, greedy): each takes as many pallets as fit.
 *   The partial pallet goes wherever it lets the truck carry the most colonies, so no truck is
 *   left with room for a pallet that stays behind.
 * - Several yards on one truck: the bound is the sum of each yard's own bound margins (conservative:
 *   √ of a sum ≤ sum of √, and each yard keeps its own degrees of freedom).
 */
import { assertInRange, assertInteger } from './guards';
import {
  assertHiveWeightStats,
  marginFactorKg,
  upperMarginKg,
  type HiveWeightStats,
} from './load-weight';

/** A truck available for the night. */
export interface TruckCapacity {
  /** Truck id, echoed back. */
  id: string;
  /** Legal payload (what it may carry), kg. */
  payloadKg: number;
  /** Pallet spots on the deck. */
  palletSpots: number;
  /** Pallets stacked per spot. */
  tiers: number;
}

/** Input of computeLoadPlan (the calculation API's `load-plan` request). */
export interface LoadPlanInput {
  /** Colonies to move. */
  colonies: number;
  /** Colonies per pallet (4 or 6 in the trade). */
  coloniesPerPallet: number;
  /** Empty pallet weight, kg. */
  palletTareKg: number;
  /** Hive weight statistics, kg. */
  hiveWeightKg: HiveWeightStats;
  /** Trucks in the order they are filled. */
  trucks: readonly TruckCapacity[];
}

/** One truck's load in computeLoadPlan. */
export interface TruckLoad {
  /** Truck id. */
  id: string;
  /** Pallets aboard. */
  pallets: number;
  /** Colonies aboard. */
  colonies: number;
  /** Expected weight: colonies × mean + pallets × tare, kg. */
  weightKg: number;
  /** One-sided 95 % upper prediction bound of the true weight, kg (≤ payload). */
  weightUpperKg: number;
}

/** Result of computeLoadPlan (the calculation API's `load-plan` response). */
export interface LoadPlan {
  /** Each truck's load, in the order given. */
  trucks: TruckLoad[];
  /** Colonies that fit on no truck. */
  unassignedColonies: number;
  /** Sum of the trucks' expected weights, kg. */
  totalWeightKg: number;
}

/** One origin yard in a night's plan. */
export interface YardSupply {
  /** Yard id, echoed back. */
  yardId: string;
  /** Colonies to pick up there. */
  colonies: number;
  /** Hive weight statistics of that yard's colonies, kg. */
  hiveWeightKg: HiveWeightStats;
  /** Colonies per pallet at that yard (defaults to the plan's). */
  coloniesPerPallet?: number;
}

/** Input of planNightLoads. */
export interface NightLoadInput {
  /** Yards in pick-up order. */
  yards: readonly YardSupply[];
  /** Default colonies per pallet. */
  coloniesPerPallet: number;
  /** Empty pallet weight, kg. */
  palletTareKg: number;
  /** Trucks in the order they are filled. */
  trucks: readonly TruckCapacity[];
}

/** One pick-up on a truck's route. */
export interface TruckStop {
  /** Yard id. */
  yardId: string;
  /** Pallets picked up there. */
  pallets: number;
  /** Colonies picked up there. */
  colonies: number;
}

/** One truck's load in planNightLoads, with its pick-ups in order. */
export interface NightTruckLoad extends TruckLoad {
  /** Pick-ups in yard order. */
  stops: TruckStop[];
}

/** What each yard sends and keeps. */
export interface YardOutcome {
  /** Yard id. */
  yardId: string;
  /** Colonies loaded on some truck. */
  loadedColonies: number;
  /** Colonies left in the yard. */
  unassignedColonies: number;
}

/** Result of planNightLoads. */
export interface NightLoadPlan {
  /** Each truck's load, in the order given. */
  trucks: NightTruckLoad[];
  /** Per-yard outcome, in the order given. */
  yards: YardOutcome[];
  /** Colonies left behind over all yards. */
  unassignedColonies: number;
  /** Trucks carrying at least one colony. */
  trucksUsed: number;
  /** Sum of the trucks' expected weights, kg. */
  totalWeightKg: number;
}

interface PreparedYard {
  yardId: string;
  stats: HiveWeightStats;
  factorKg: number;
  coloniesPerPallet: number;
  fullPalletsLeft: number;
  partialColonies: number;
}

interface TruckState {
  truck: TruckCapacity;
  maxPallets: number;
  pallets: number;
  /** Colonies aboard per yard index. */
  coloniesByYard: Map<number, number>;
  stops: TruckStop[];
}

function assertTruck(truck: TruckCapacity, i: number): void {
  if (truck === null || typeof truck !== 'object')
    throw new TypeError(`trucks[${i}] must be an object`);
  if (typeof truck.id !== 'string' || truck.id === '') {
    throw new TypeError(`trucks[${i}].id must be a non-empty string, got ${String(truck.id)}`);
  }
  assertInRange(`trucks[${i}].payloadKg`, truck.payloadKg, 0);
  assertInteger(`trucks[${i}].palletSpots`, truck.palletSpots, 0);
  assertInteger(`trucks[${i}].tiers`, truck.tiers, 1);
}

/** Expected and upper-bound weight of a truck's load, from scratch (one formula for checks and output). */
function truckWeight(
  coloniesByYard: ReadonlyMap<number, number>,
  pallets: number,
  yards: readonly PreparedYard[],
  palletTareKg: number,
): { weightKg: number; weightUpperKg: number } {
  let coloniesKg = 0;
  let marginKg = 0;
  for (const [index, colonies] of coloniesByYard) {
    const yard = yards[index];
    coloniesKg += colonies * yard.stats.mean;
    marginKg += upperMarginKg(colonies, yard.stats, yard.factorKg);
  }
  const weightKg = coloniesKg + pallets * palletTareKg;
  return { weightKg, weightUpperKg: weightKg + marginKg };
}

/** Loads as many of yard `yardIndex`'s pallets as fit on the truck; mutates both. */
function loadFromYard(
  state: TruckState,
  yards: readonly PreparedYard[],
  yardIndex: number,
  palletTareKg: number,
): void {
  const yard = yards[yardIndex];
  const yardColonies = state.coloniesByYard.get(yardIndex) ?? 0;
  const trial = new Map(state.coloniesByYard);
  const fits = (pallets: number, colonies: number): boolean => {
    if (state.pallets + pallets > state.maxPallets) return false;
    trial.set(yardIndex, yardColonies + colonies);
    const { weightUpperKg } = truckWeight(trial, state.pallets + pallets, yards, palletTareKg);
    return weightUpperKg <= state.truck.payloadKg;
  };
  const perPallet = yard.coloniesPerPallet;
  const maxFull = (extraPallets: number, extraColonies: number): number => {
    let low = 0;
    let high = Math.min(yard.fullPalletsLeft, state.maxPallets - state.pallets - extraPallets);
    if (high < 0 || !fits(extraPallets, extraColonies)) return -1;
    while (low < high) {
      const mid = Math.ceil((low + high) / 2);
      if (fits(extraPallets + mid, extraColonies + mid * perPallet)) low = mid;
      else high = mid - 1;
    }
    return low;
  };

  // Candidates: full pallets only; full pallets topped with the partial one; partial first.
  const candidates: { full: number; partial: boolean }[] = [];
  const fullOnly = maxFull(0, 0);
  if (fullOnly >= 0) {
    candidates.push({ full: fullOnly, partial: false });
    if (
      yard.partialColonies > 0 &&
      fits(fullOnly + 1, fullOnly * perPallet + yard.partialColonies)
    ) {
      candidates.push({ full: fullOnly, partial: true });
    }
  }
  if (yard.partialColonies > 0) {
    const afterPartial = maxFull(1, yard.partialColonies);
    if (afterPartial >= 0) candidates.push({ full: afterPartial, partial: true });
  }
  const coloniesOf = (c: { full: number; partial: boolean }): number =>
    c.full * perPallet + (c.partial ? yard.partialColonies : 0);
  const best = candidates.reduce<{ full: number; partial: boolean } | null>(
    (a, c) => (a === null || coloniesOf(c) > coloniesOf(a) ? c : a),
    null,
  );
  if (best === null || coloniesOf(best) === 0) return;

  const addPallets = best.full + (best.partial ? 1 : 0);
  const addColonies = coloniesOf(best);
  state.pallets += addPallets;
  state.coloniesByYard.set(yardIndex, yardColonies + addColonies);
  const stop = state.stops[state.stops.length - 1];
  if (yardColonies > 0 && stop) {
    stop.pallets += addPallets;
    stop.colonies += addColonies;
  } else {
    state.stops.push({ yardId: yard.yardId, pallets: addPallets, colonies: addColonies });
  }
  yard.fullPalletsLeft -= best.full;
  if (best.partial) yard.partialColonies = 0;
}

/** Plans the night's loads from several yards (in pick-up order) onto trucks (in fill order). */
export function planNightLoads(input: NightLoadInput): NightLoadPlan {
  assertInteger('coloniesPerPallet', input.coloniesPerPallet, 1);
  assertInRange('palletTareKg', input.palletTareKg, 0);
  if (!Array.isArray(input.trucks)) throw new TypeError('trucks must be an array');
  if (!Array.isArray(input.yards)) throw new TypeError('yards must be an array');
  input.trucks.forEach(assertTruck);

  const yards: PreparedYard[] = input.yards.map((yard, i) => {
    assertInteger(`yards[${i}].colonies`, yard.colonies, 0);
    assertHiveWeightStats(`yards[${i}].hiveWeightKg`, yard.hiveWeightKg);
    const perPallet = yard.coloniesPerPallet ?? input.coloniesPerPallet;
    assertInteger(`yards[${i}].coloniesPerPallet`, perPallet, 1);
    return {
      yardId: yard.yardId,
      stats: yard.hiveWeightKg,
      factorKg: marginFactorKg(yard.hiveWeightKg),
      coloniesPerPallet: perPallet,
      fullPalletsLeft: Math.floor(yard.colonies / perPallet),
      partialColonies: yard.colonies % perPallet,
    };
  });
  const states: TruckState[] = input.trucks.map((truck) => ({
    truck,
    maxPallets: truck.palletSpots * truck.tiers,
    pallets: 0,
    coloniesByYard: new Map<number, number>(),
    stops: [],
  }));

  yards.forEach((yard, yardIndex) => {
    for (const state of states) {
      if (yard.fullPalletsLeft === 0 && yard.partialColonies === 0) break;
      loadFromYard(state, yards, yardIndex, input.palletTareKg);
    }
  });

  const trucks: NightTruckLoad[] = states.map((s) => {
    const colonies = s.stops.reduce((sum, stop) => sum + stop.colonies, 0);
    const { weightKg, weightUpperKg } = truckWeight(
      s.coloniesByYard,
      s.pallets,
      yards,
      input.palletTareKg,
    );
    return {
      id: s.truck.id,
      pallets: s.pallets,
      colonies,
      weightKg,
      weightUpperKg,
      stops: s.stops,
    };
  });
  const yardOutcomes: YardOutcome[] = yards.map((yard, i) => {
    const left = yard.fullPalletsLeft * yard.coloniesPerPallet + yard.partialColonies;
    return {
      yardId: yard.yardId,
      loadedColonies: input.yards[i].colonies - left,
      unassignedColonies: left,
    };
  });
  return {
    trucks,
    yards: yardOutcomes,
    unassignedColonies: yardOutcomes.reduce((sum, y) => sum + y.unassignedColonies, 0),
    trucksUsed: trucks.filter((t) => t.colonies > 0).length,
    totalWeightKg: trucks.reduce((sum, t) => sum + t.weightKg, 0),
  };
}

/** Plans one origin's colonies onto trucks: the calculation API's `load-plan` contract. */
export function computeLoadPlan(input: LoadPlanInput): LoadPlan {
  assertInteger('colonies', input.colonies, 0);
  assertHiveWeightStats('hiveWeightKg', input.hiveWeightKg);
  const night = planNightLoads({
    yards: [{ yardId: 'origin', colonies: input.colonies, hiveWeightKg: input.hiveWeightKg }],
    coloniesPerPallet: input.coloniesPerPallet,
    palletTareKg: input.palletTareKg,
    trucks: input.trucks,
  });
  return {
    trucks: night.trucks.map(({ id, pallets, colonies, weightKg, weightUpperKg }) => ({
      id,
      pallets,
      colonies,
      weightKg,
      weightUpperKg,
    })),
    unassignedColonies: night.unassignedColonies,
    totalWeightKg: night.totalWeightKg,
  };
}

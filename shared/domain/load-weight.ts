/**
 * Expected weight of a load of colonies and its one-sided 95 % upper prediction bound.
 *
 * With n weighed hives (mean x̄, sd s) the true total of c other hives, T = Σ Xᵢ, has
 * Var(T − c·x̄) = σ²(c + c²/n); the prediction bound is c·x̄ + t(0.95, n − 1)·s·√(c + c²/n)
 * (prediction interval for a sum, e.g. Hahn & Meeker, *Statistical Intervals*, 1991, §4.7).
 * DESIGN.md fixes this formula as the calculation API's contract.
 */
import { assertInRange, assertInteger } from './guards';
import { studentTQuantile } from './statistics';

/** One-sided confidence used for every load bound. */
export const LOAD_BOUND_CONFIDENCE = 0.95;

/** Hive-weight statistics as the load plan takes them (kg). */
export interface HiveWeightStats {
  /** Mean hive weight, kg. */
  mean: number;
  /** Sample standard deviation of hive weight, kg; 0 when the weight is taken as exact. */
  sd: number;
  /** Number of hives weighed (≥ 2 when sd > 0). */
  samples: number;
}

/**
 * Checks the statistics. sd = 0 means a weight taken as exact (e.g. computed from the box setup)
 * and any samples ≥ 1 is accepted; sd > 0 needs samples ≥ 2 because t(0.95, n − 1) needs n − 1 ≥ 1.
 */
export function assertHiveWeightStats(name: string, stats: HiveWeightStats): void {
  if (stats === null || typeof stats !== 'object') {
    throw new TypeError(`${name} must be { mean, sd, samples }, got ${String(stats)}`);
  }
  assertInRange(`${name}.mean`, stats.mean, Number.MIN_VALUE);
  assertInRange(`${name}.sd`, stats.sd, 0);
  assertInteger(`${name}.samples`, stats.samples, 1);
  if (stats.sd > 0 && stats.samples < 2) {
    throw new RangeError(
      `${name}.samples must be at least 2 when sd > 0 (t needs ≥ 1 degree of freedom), got samples=${stats.samples}, sd=${stats.sd}`,
    );
  }
}

/** t(0.95, samples − 1) × sd: the margin per unit of √(c + c²/n); 0 when sd = 0. */
export function marginFactorKg(stats: HiveWeightStats): number {
  if (stats.sd === 0) return 0;
  return studentTQuantile(LOAD_BOUND_CONFIDENCE, stats.samples - 1) * stats.sd;
}

/** Expected weight of `colonies` hives, kg (colonies × mean). */
export function expectedColoniesWeightKg(colonies: number, stats: HiveWeightStats): number {
  return colonies * stats.mean;
}

/** Upper-bound margin above the expected weight of `colonies` hives, kg. */
export function upperMarginKg(
  colonies: number,
  stats: HiveWeightStats,
  factorKg = marginFactorKg(stats),
): number {
  if (colonies === 0) return 0;
  return factorKg * Math.sqrt(colonies + (colonies * colonies) / stats.samples);
}

/** Expected and upper-bound weight of a load of colonies on pallets. */
export interface LoadWeight {
  /** colonies × mean + pallets × tare, kg. */
  weightKg: number;
  /** One-sided 95 % upper prediction bound of the true total, kg. */
  weightUpperKg: number;
}

/** Expected weight and its 95 % upper prediction bound for a load, per DESIGN.md's contract. */
export function loadWeight(
  colonies: number,
  pallets: number,
  palletTareKg: number,
  stats: HiveWeightStats,
): LoadWeight {
  const expected = expectedColoniesWeightKg(colonies, stats) + pallets * palletTareKg;
  return { weightKg: expected, weightUpperKg: expected + upperMarginKg(colonies, stats) };
}

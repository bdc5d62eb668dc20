/**
 * Colony strength from an inspection sample of frames of bees: mean, spread, share at or above a
 * contract minimum, their uncertainty, and the sample size for a wanted margin.
 * A frame counts when about three-quarters covered at 60 °F or warmer (Traynor 1993, in Delaplane &
 * Mayer 2000); inspections sample about 10 % of colonies at random (Sagili & Burgett, PNW 623).
 */
import { assertInRange, assertInteger } from './guards';
import {
  mean,
  meanConfidenceInterval,
  normalQuantile,
  sampleStandardDeviation,
  wilsonInterval,
  type Interval,
} from './statistics';

/** Share of colonies inspected in a common strength inspection (PNW 623). */
export const DEFAULT_INSPECTION_SHARE = 0.1;

/** Strength summary of an inspection sample. */
export interface StrengthSummary {
  /** Colonies inspected. */
  samples: number;
  /** Mean frames of bees. */
  meanFrames: number;
  /** Sample standard deviation, frames. */
  sdFrames: number;
  /** t confidence interval of the mean, frames. */
  meanInterval: Interval;
  /** Colonies in the sample at or above the minimum. */
  atOrAboveMinimum: number;
  /** Share of the sample at or above the minimum. */
  shareAtOrAboveMinimum: number;
  /** Wilson confidence interval of that share. */
  shareInterval: Interval;
  /** Confidence level of both intervals. */
  confidence: number;
}

/** Summarises frames-of-bees counts against a contract minimum (two-sided intervals). */
export function summariseStrength(
  framesOfBees: readonly number[],
  minimumFrames: number,
  confidence = 0.95,
): StrengthSummary {
  if (!Array.isArray(framesOfBees) || framesOfBees.length < 2) {
    throw new RangeError(
      `a strength summary needs at least 2 inspected colonies, got ${framesOfBees?.length ?? 0}`,
    );
  }
  framesOfBees.forEach((f, i) => assertInRange(`framesOfBees[${i}]`, f, 0, 40));
  assertInRange('minimumFrames', minimumFrames, 0, 40);
  const meanFrames = mean(framesOfBees);
  const sdFrames = sampleStandardDeviation(framesOfBees);
  const atOrAbove = framesOfBees.filter((f) => f >= minimumFrames).length;
  return {
    samples: framesOfBees.length,
    meanFrames,
    sdFrames,
    meanInterval: meanConfidenceInterval(meanFrames, sdFrames, framesOfBees.length, confidence),
    atOrAboveMinimum: atOrAbove,
    shareAtOrAboveMinimum: atOrAbove / framesOfBees.length,
    shareInterval: wilsonInterval(atOrAbove, framesOfBees.length, confidence),
    confidence,
  };
}

/**
 * Colonies to inspect so the mean's two-sided margin is about ±marginFrames:
 * n₀ = (z·sd/margin)², with the finite population correction n = n₀ / (1 + (n₀ − 1)/N) when the
 * population N is given (Cochran, *Sampling Techniques*, 3rd ed., 1977, eq. 4.1–4.2). Rounded up.
 */
export function sampleSizeForMargin(
  sdFrames: number,
  marginFrames: number,
  confidence = 0.95,
  populationSize?: number,
): number {
  assertInRange('sdFrames', sdFrames, 0);
  assertInRange('marginFrames', marginFrames, Number.MIN_VALUE);
  assertInRange('confidence', confidence, Number.MIN_VALUE, 1 - Number.EPSILON);
  const z = normalQuantile(1 - (1 - confidence) / 2);
  const n0 = ((z * sdFrames) / marginFrames) ** 2;
  if (populationSize === undefined) return Math.max(1, Math.ceil(n0 - 1e-9));
  assertInteger('populationSize', populationSize, 1);
  return Math.max(
    1,
    Math.min(populationSize, Math.ceil(n0 / (1 + (n0 - 1) / populationSize) - 1e-9)),
  );
}

/** Colonies to inspect for a share of a drop or yard (10 % by default, PNW 623), at least 1. */
export function inspectionSampleSize(colonies: number, share = DEFAULT_INSPECTION_SHARE): number {
  assertInteger('colonies', colonies, 0);
  assertInRange('share', share, 0, 1);
  if (colonies === 0) return 0;
  return Math.min(colonies, Math.max(1, Math.ceil(colonies * share - 1e-9)));
}

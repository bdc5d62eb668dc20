/**
 * Hive weight from its box setup, and the summary of weights sampled on a scale at the yard.
 *
 * Model: hive = Σ boxes (empty box with drawn comb + honey capacity × fill) + bees + floor and lid.
 * The constants are chosen to reproduce the trade's figures: a 10-frame box full of honey weighs
 * about 80–90 lb (deep), 50–60 lb (medium) and 40 lb (shallow) — common practice, no single source
 * (REFERENCES.md, Weights). Each constant below says where it comes from.
 */
import { assertInRange } from './guards';
import { mean, sampleStandardDeviation } from './statistics';
import { poundsToKg } from './units';

/** Box depths used in Langstroth hives. */
export type BoxSize = 'deep' | 'medium' | 'shallow';

/** All box sizes, deepest first. */
export const BOX_SIZES: readonly BoxSize[] = ['deep', 'medium', 'shallow'];

/** Weight constants of one 10-frame box. */
export interface BoxConstants {
  /** Wooden box with ten frames of drawn comb, no honey, kg. */
  equipmentKg: number;
  /** Honey the ten frames hold when fully capped, kg. */
  honeyCapacityKg: number;
  /** Where the figures come from. */
  source: string;
}

/**
 * Per-box constants. Equipment weights: from memory (a pine deep body about 8 lb plus ten drawn
 * frames about 0.6 lb each; medium and shallow in proportion). Honey capacities: common practice,
 * no source — set so a full box lands inside the trade's range: deep 14 + 70 = 84 lb (80–90),
 * medium 10 + 45 = 55 lb (50–60), shallow 7 + 33 = 40 lb (about 40).
 */
export const BOX_CONSTANTS: Readonly<Record<BoxSize, BoxConstants>> = {
  deep: {
    equipmentKg: poundsToKg(14),
    honeyCapacityKg: poundsToKg(70),
    source: 'equipment from memory; full box 80–90 lb, common practice, no source',
  },
  medium: {
    equipmentKg: poundsToKg(10),
    honeyCapacityKg: poundsToKg(45),
    source: 'equipment from memory; full box 50–60 lb, common practice, no source',
  },
  shallow: {
    equipmentKg: poundsToKg(7),
    honeyCapacityKg: poundsToKg(33),
    source: 'equipment from memory; full box about 40 lb, common practice, no source',
  },
};

/** Adult bees per well-covered deep frame (Sagili & Burgett, PNW 623, 2011). */
export const BEES_PER_FRAME = 2_400;

/** Worker bees per pound: about 3,500–4,500; 4,000 used (from memory). */
export const BEES_PER_LB = 4_000;

/** Frames of bees assumed for a colony when none is given: the almond 8-frame average (ABC). */
export const DEFAULT_FRAMES_OF_BEES = 8;

/** Bottom board (floor) and migratory lid together: about 10 lb (from memory). */
export const FLOOR_AND_LID_KG = poundsToKg(10);

/** Mass of the adult bees of a colony of `framesOfBees` frames, kg. */
export function beesWeightKg(framesOfBees = DEFAULT_FRAMES_OF_BEES): number {
  assertInRange('framesOfBees', framesOfBees, 0, 60);
  return poundsToKg((framesOfBees * BEES_PER_FRAME) / BEES_PER_LB);
}

/** One box of a hive setup. */
export interface HiveBox {
  /** Box depth. */
  size: BoxSize;
  /** Share of the box's honey capacity filled, 0..1. */
  honeyFill: number;
}

/** Input of computeHiveWeight. */
export interface HiveWeightInput {
  /** Boxes from bottom to top. */
  boxes: readonly HiveBox[];
  /** Add the adult bees (default true). */
  includeBees?: boolean;
  /** Add a floor and a lid (default true). */
  includeFloorAndLid?: boolean;
  /** Frames of bees when bees are included (default 8). */
  framesOfBees?: number;
}

/** Breakdown of a hive's weight, kg. */
export interface HiveWeightParts {
  /** Boxes with drawn comb, no honey. */
  equipmentKg: number;
  /** Honey in all boxes. */
  honeyKg: number;
  /** Adult bees. */
  beesKg: number;
  /** Floor and lid. */
  floorAndLidKg: number;
}

/** Result of computeHiveWeight. */
export interface HiveWeight {
  /** Total weight, kg. */
  weightKg: number;
  /** The parts that add up to weightKg. */
  parts: HiveWeightParts;
}

/** Weight of one hive from its box setup and honey fill, with optional bees and floor/lid. */
export function computeHiveWeight(input: HiveWeightInput): HiveWeight {
  const { boxes, includeBees = true, includeFloorAndLid = true } = input;
  if (!Array.isArray(boxes) || boxes.length === 0) {
    throw new RangeError(`boxes must list at least one box, got ${JSON.stringify(boxes)}`);
  }
  let equipmentKg = 0;
  let honeyKg = 0;
  boxes.forEach((box, i) => {
    const constants = BOX_CONSTANTS[box.size as BoxSize] as BoxConstants | undefined;
    if (!constants) {
      throw new TypeError(
        `boxes[${i}].size must be deep, medium or shallow, got ${String(box.size)}`,
      );
    }
    assertInRange(`boxes[${i}].honeyFill`, box.honeyFill, 0, 1);
    equipmentKg += constants.equipmentKg;
    honeyKg += constants.honeyCapacityKg * box.honeyFill;
  });
  const beesKg = includeBees ? beesWeightKg(input.framesOfBees) : 0;
  const floorAndLidKg = includeFloorAndLid ? FLOOR_AND_LID_KG : 0;
  return {
    weightKg: equipmentKg + honeyKg + beesKg + floorAndLidKg,
    parts: { equipmentKg, honeyKg, beesKg, floorAndLidKg },
  };
}

/** Mean, sample standard deviation and count of hive weights, as the load plan takes them. */
export interface WeightSampleSummary {
  /** Mean hive weight, kg. */
  mean: number;
  /** Sample standard deviation (n − 1), kg. */
  sd: number;
  /** Number of hives weighed. */
  samples: number;
}

/** Summarises hive weights weighed at the yard; needs at least 2 (a spread needs two). */
export function summariseWeightSamples(samplesKg: readonly number[]): WeightSampleSummary {
  if (!Array.isArray(samplesKg) || samplesKg.length < 2) {
    throw new RangeError(
      `at least 2 weighed hives are needed to estimate the spread, got ${samplesKg?.length ?? 0}`,
    );
  }
  samplesKg.forEach((w, i) => assertInRange(`samplesKg[${i}]`, w, Number.MIN_VALUE));
  return {
    mean: mean(samplesKg),
    sd: sampleStandardDeviation(samplesKg),
    samples: samplesKg.length,
  };
}

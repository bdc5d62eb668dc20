/**
 * Winter stores: honey a colony needs for the region vs honey estimated from its weight → feed.
 *
 * Need by latitude: from about 60 lb of honey in the deep south to about 180 lb in the northern
 * states and Canada (REFERENCES.md, common practice, no source). The bands in between are an
 * even interpolation of that rule of thumb (ours, editable). Estimated stores = hive weight −
 * empty boxes with comb − floor and lid − bees (hive-weight.ts constants).
 * Sugar: honey is about 82 % sugars (about 17–18 % water), so 1 kg of honey ≈ 0.82 kg of sugar;
 * 2:1 syrup (2 parts sugar to 1 water by weight) is 2/3 sugar (from memory).
 */
import { assertInRange, assertInteger } from './guards';
import { BOX_CONSTANTS, FLOOR_AND_LID_KG, beesWeightKg, type BoxSize } from './hive-weight';
import { poundsToKg } from './units';

/** Stores needed from a latitude (absolute, degrees) up to the next band. */
export interface StoresBand {
  /** Band starts at this absolute latitude, degrees. */
  fromLatitude: number;
  /** Honey needed, kg. */
  storesKg: number;
}

/** Default bands: 60 lb below 30°, rising by band to 180 lb at 50° and beyond (practice). */
export const DEFAULT_STORES_BANDS: readonly StoresBand[] = [
  { fromLatitude: 0, storesKg: poundsToKg(60) },
  { fromLatitude: 30, storesKg: poundsToKg(80) },
  { fromLatitude: 35, storesKg: poundsToKg(100) },
  { fromLatitude: 40, storesKg: poundsToKg(130) },
  { fromLatitude: 45, storesKg: poundsToKg(160) },
  { fromLatitude: 50, storesKg: poundsToKg(180) },
];

/** Sugar in honey, by weight (about 82 %, from memory). */
export const SUGAR_SHARE_OF_HONEY = 0.82;
/** Sugar in 2:1 syrup, by weight. */
export const SUGAR_SHARE_OF_2_TO_1_SYRUP = 2 / 3;

/** Honey a colony needs to winter at a latitude (either hemisphere), kg. */
export function winterStoresNeededKg(
  latitude: number,
  bands: readonly StoresBand[] = DEFAULT_STORES_BANDS,
): number {
  assertInRange('latitude', latitude, -90, 90);
  if (bands.length === 0) throw new RangeError('bands must list at least one band');
  const absolute = Math.abs(latitude);
  const sorted = [...bands].sort((a, b) => a.fromLatitude - b.fromLatitude);
  let stores = sorted[0].storesKg;
  for (const band of sorted) if (absolute >= band.fromLatitude) stores = band.storesKg;
  return stores;
}

/** Honey stores in a hive estimated from its weight and box setup, kg (never below 0). */
export function estimatedStoresKg(
  hiveWeightKg: number,
  boxes: readonly BoxSize[],
  options: { includesFloorAndLid?: boolean; framesOfBees?: number } = {},
): number {
  assertInRange('hiveWeightKg', hiveWeightKg, 0);
  if (boxes.length === 0) throw new RangeError('boxes must list at least one box');
  const equipmentKg = boxes.reduce((s, size, i) => {
    const constants = BOX_CONSTANTS[size] as (typeof BOX_CONSTANTS)[BoxSize] | undefined;
    if (!constants)
      throw new TypeError(`boxes[${i}] must be deep, medium or shallow, got ${String(size)}`);
    return s + constants.equipmentKg;
  }, 0);
  const floorAndLid = options.includesFloorAndLid === false ? 0 : FLOOR_AND_LID_KG;
  return Math.max(0, hiveWeightKg - equipmentKg - floorAndLid - beesWeightKg(options.framesOfBees));
}

/** Input of computeWinterFeed. */
export interface WinterFeedInput {
  /** Yard latitude, degrees. */
  latitude: number;
  /** Mean hive weight at the yard, kg. */
  meanHiveWeightKg: number;
  /** Box setup, bottom to top. */
  boxes: readonly BoxSize[];
  /** Colonies in the yard. */
  colonies: number;
  /** Frames of bees (default 8). */
  framesOfBees?: number;
  /** Weights include floor and lid (default true). */
  includesFloorAndLid?: boolean;
  /** Override of the stores-by-latitude table. */
  bands?: readonly StoresBand[];
}

/** Result of computeWinterFeed (kg). */
export interface WinterFeed {
  /** Honey needed per colony. */
  storesNeededKg: number;
  /** Honey estimated per colony. */
  storesEstimatedKg: number;
  /** Honey-equivalent feed per colony: max(0, needed − estimated). */
  feedPerColonyKg: number;
  /** Honey-equivalent feed for the yard. */
  feedForYardKg: number;
  /** Sugar per colony for that feed. */
  sugarPerColonyKg: number;
  /** 2:1 syrup per colony for that feed. */
  syrup2to1PerColonyKg: number;
  /** 2:1 syrup for the yard. */
  syrup2to1ForYardKg: number;
}

/** Feed needed per colony and per yard to reach the region's winter stores. */
export function computeWinterFeed(input: WinterFeedInput): WinterFeed {
  assertInteger('colonies', input.colonies, 0);
  const storesNeededKg = winterStoresNeededKg(input.latitude, input.bands);
  const storesEstimatedKg = estimatedStoresKg(input.meanHiveWeightKg, input.boxes, {
    includesFloorAndLid: input.includesFloorAndLid,
    framesOfBees: input.framesOfBees,
  });
  const feedPerColonyKg = Math.max(0, storesNeededKg - storesEstimatedKg);
  const sugarPerColonyKg = feedPerColonyKg * SUGAR_SHARE_OF_HONEY;
  const syrup2to1PerColonyKg = sugarPerColonyKg / SUGAR_SHARE_OF_2_TO_1_SYRUP;
  return {
    storesNeededKg,
    storesEstimatedKg,
    feedPerColonyKg,
    feedForYardKg: feedPerColonyKg * input.colonies,
    sugarPerColonyKg,
    syrup2to1PerColonyKg,
    syrup2to1ForYardKg: syrup2to1PerColonyKg * input.colonies,
  };
}

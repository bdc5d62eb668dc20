/**
 * Default honey-bee stocking rates by crop (colonies per acre), with their range and source
 * (REFERENCES.md, "Pollination stocking rates"). The product lets the user override each.
 */

/** How well a figure is supported: a named source, the trade's practice, or memory. */
export type Evidence = 'source' | 'practice' | 'memory';

/** Crop keys of the calculation API. */
export const CROP_KEYS = [
  'almond',
  'apple',
  'pear',
  'plum',
  'cherry',
  'blueberry',
  'cranberry',
  'cucumber',
  'melon',
  'watermelon',
  'squash',
  'canola',
  'alfalfa-seed',
  'sunflower',
  'avocado',
  'honey',
] as const;

/** A crop key of the calculation API. */
export type CropKey = (typeof CROP_KEYS)[number];

/** One crop's stocking rate. */
export interface Crop {
  /** API key. */
  key: CropKey;
  /** English name. */
  name: string;
  /** Default colonies per acre; null for a honey (nectar-flow) location. */
  hivesPerAcre: number | null;
  /** Published range, colonies per acre; null when none. */
  range: { min: number; max: number } | null;
  /** Where the figures come from. */
  source: string;
  /** How well the figures are supported. */
  evidence: Evidence;
}

/** Generic fallback: 1 colony per acre (2.5 per ha), COLOSS BEEBOOK vol. I (Delaplane et al. 2013). */
export const GENERIC_HIVES_PER_ACRE = 1;

/** The crops table, keyed by crop. Defaults lie inside each range. */
export const CROPS: Readonly<Record<CropKey, Crop>> = {
  almond: {
    key: 'almond',
    name: 'Almond',
    hivesPerAcre: 2,
    range: { min: 1, max: 3 },
    source: 'Almond Board of California guidance; UC Cooperative Extension',
    evidence: 'source',
  },
  apple: {
    key: 'apple',
    name: 'Apple',
    hivesPerAcre: 1,
    range: { min: 1, max: 2.5 },
    source: 'Canadian Honey Council; Good Fruit Grower (WSU) — up to 2.5 in dense plantings',
    evidence: 'source',
  },
  pear: {
    key: 'pear',
    name: 'Pear',
    hivesPerAcre: 1,
    range: { min: 0.8, max: 1.6 },
    source: 'Ontario Ministry of Agriculture (OMAFRA) pollination notes: 2–4 per ha',
    evidence: 'source',
  },
  plum: {
    key: 'plum',
    name: 'Plum',
    hivesPerAcre: 1,
    range: { min: 0.8, max: 1.6 },
    source: 'Ontario Ministry of Agriculture (OMAFRA) pollination notes: 2–4 per ha',
    evidence: 'source',
  },
  cherry: {
    key: 'cherry',
    name: 'Sweet cherry',
    hivesPerAcre: 2,
    range: { min: 2, max: 3 },
    source: 'Good Fruit Grower (WSU)',
    evidence: 'source',
  },
  blueberry: {
    key: 'blueberry',
    name: 'Highbush blueberry',
    hivesPerAcre: 3,
    range: { min: 3, max: 4 },
    source:
      "Washington State University via Oregon Blueberry Commission; Nova Scotia Beekeepers' Association",
    evidence: 'source',
  },
  cranberry: {
    key: 'cranberry',
    name: 'Cranberry',
    hivesPerAcre: 2,
    range: { min: 2, max: 3 },
    source: "Nova Scotia Beekeepers' Association; SARE “Managing Alternative Pollinators”",
    evidence: 'source',
  },
  cucumber: {
    key: 'cucumber',
    name: 'Cucumber',
    hivesPerAcre: 1,
    range: { min: 1, max: 1 },
    source: 'NC State Beekeeping Insect Note 7B',
    evidence: 'source',
  },
  melon: {
    key: 'melon',
    name: 'Melon (cantaloupe)',
    hivesPerAcre: 1,
    range: { min: 1, max: 1.5 },
    source: 'University of Guelph pollination guide; Reyes-Carrillo et al. 2006',
    evidence: 'source',
  },
  watermelon: {
    key: 'watermelon',
    name: 'Watermelon',
    hivesPerAcre: 1,
    range: { min: 1, max: 1.6 },
    source: 'Clemson Extension; NT Department of Primary Industry (Australia)',
    evidence: 'source',
  },
  squash: {
    key: 'squash',
    name: 'Pumpkin and squash',
    hivesPerAcre: 1,
    range: { min: 1, max: 2 },
    source: 'Penn State Extension',
    evidence: 'source',
  },
  canola: {
    key: 'canola',
    name: 'Canola',
    hivesPerAcre: 1,
    range: { min: 1, max: 2 },
    source: 'Canadian Honey Council (1.5–2 for hybrid seed)',
    evidence: 'source',
  },
  'alfalfa-seed': {
    key: 'alfalfa-seed',
    name: 'Alfalfa seed',
    hivesPerAcre: 3,
    range: { min: 2, max: 5 },
    source: 'from memory (honey-bee-pollinated seed fields in the western US); unverified',
    evidence: 'memory',
  },
  sunflower: {
    key: 'sunflower',
    name: 'Sunflower (hybrid seed)',
    hivesPerAcre: 1,
    range: { min: 0.5, max: 2 },
    source: 'from memory; default is the COLOSS BEEBOOK generic 1 per acre (Delaplane et al. 2013)',
    evidence: 'memory',
  },
  avocado: {
    key: 'avocado',
    name: 'Avocado',
    hivesPerAcre: 2,
    range: { min: 0.8, max: 4 },
    source: 'McGregor, USDA Agriculture Handbook 496 (1976)',
    evidence: 'source',
  },
  honey: {
    key: 'honey',
    name: 'Honey location (nectar flow)',
    hivesPerAcre: null,
    range: null,
    source: 'no stocking rate: a colony cap per location, a few dozen typical (common practice)',
    evidence: 'practice',
  },
};

/** True when `key` is one of the crop keys. */
export function isCropKey(key: unknown): key is CropKey {
  return typeof key === 'string' && (CROP_KEYS as readonly string[]).includes(key);
}

/** The crops as a list, in key order (what `GET /api/crops` returns). */
export function listCrops(): Crop[] {
  return CROP_KEYS.map((key) => CROPS[key]);
}

/**
 * The stocking rate to use: the override when given, else the crop's default.
 * Throws when neither exists (an unknown crop, or a honey location, with no override).
 */
export function resolveHivesPerAcre(crop: string, hivesPerAcre?: number): number {
  if (hivesPerAcre !== undefined) {
    if (!(typeof hivesPerAcre === 'number' && Number.isFinite(hivesPerAcre) && hivesPerAcre > 0)) {
      throw new RangeError(
        `hivesPerAcre must be a number greater than 0, got ${String(hivesPerAcre)}`,
      );
    }
    return hivesPerAcre;
  }
  const rate = isCropKey(crop) ? CROPS[crop].hivesPerAcre : null;
  if (rate === null) {
    throw new RangeError(
      isCropKey(crop)
        ? `crop ${JSON.stringify(crop)} has no stocking rate: give hivesPerAcre`
        : `unknown crop ${JSON.stringify(crop)}: give hivesPerAcre or one of ${CROP_KEYS.join(', ')}`,
    );
  }
  return rate;
}

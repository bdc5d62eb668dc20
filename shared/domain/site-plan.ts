/**
 * Site plan (the calculation API's `site-plan`): acreage, colonies from the stocking rate,
 * pallets, and drop points spread evenly inside the boundary.
 *
 * Decisions: the boundary's area wins over `areaHa` when both are given; colonies =
 * ⌈acres × rate⌉ (the grower gets at least the rate); pallets = ⌈colonies ÷ per pallet⌉;
 * drops = ⌈pallets ÷ pallets per drop⌉, the last drop taking the remainder; without a boundary
 * no drop can be placed and `drops` is empty.
 */
import type { Feature, FeatureCollection, Point, Polygon } from 'geojson';
import { resolveHivesPerAcre } from './crops';
import { placeDropsInPolygon } from './drop-placement';
import { assertInRange, assertInteger } from './guards';
import { boundaryAreaHa } from './site-boundary';
import { haToAcres } from './units';

/** Input of computeSitePlan. */
export interface SitePlanInput {
  /** Crop key (see crops.ts). */
  crop: string;
  /** Field boundary. */
  boundary?: Polygon;
  /** Area when no boundary is drawn, ha. */
  areaHa?: number;
  /** Override of the crop's stocking rate, colonies per acre. */
  hivesPerAcre?: number;
  /** Colonies per pallet. */
  coloniesPerPallet: number;
  /** Pallets set down at each drop. */
  palletsPerDrop: number;
}

/** Properties of one drop point. */
export interface DropProperties {
  /** 1-based drop number. */
  drop: number;
  /** Pallets at this drop. */
  pallets: number;
  /** Colonies at this drop. */
  colonies: number;
}

/** Result of computeSitePlan. */
export interface SitePlan {
  /** Field area, ha. */
  areaHa: number;
  /** Field area, acres. */
  areaAcres: number;
  /** Stocking rate used, colonies per acre. */
  hivesPerAcre: number;
  /** Colonies to place. */
  colonies: number;
  /** Pallets to place. */
  pallets: number;
  /** Drop points with their pallets and colonies. */
  drops: FeatureCollection<Point, DropProperties>;
}

/** Colonies for an area at a stocking rate, rounded up (tolerating floating-point noise). */
export function coloniesForArea(areaAcres: number, hivesPerAcre: number): number {
  return Math.ceil(areaAcres * hivesPerAcre - 1e-9);
}

/** Plans colonies, pallets and drop points for a site. */
export function computeSitePlan(input: SitePlanInput): SitePlan {
  const hivesPerAcre = resolveHivesPerAcre(input.crop, input.hivesPerAcre);
  assertInteger('coloniesPerPallet', input.coloniesPerPallet, 1);
  assertInteger('palletsPerDrop', input.palletsPerDrop, 1);
  let areaHa: number;
  if (input.boundary !== undefined) {
    areaHa = boundaryAreaHa(input.boundary);
  } else if (input.areaHa !== undefined) {
    assertInRange('areaHa', input.areaHa, Number.MIN_VALUE);
    areaHa = input.areaHa;
  } else {
    throw new RangeError('give a boundary or areaHa');
  }
  const areaAcres = haToAcres(areaHa);
  const colonies = coloniesForArea(areaAcres, hivesPerAcre);
  const pallets = Math.ceil(colonies / input.coloniesPerPallet);
  const dropCount = input.boundary ? Math.ceil(pallets / input.palletsPerDrop) : 0;
  const positions = input.boundary ? placeDropsInPolygon(input.boundary, dropCount) : [];
  let coloniesLeft = colonies;
  const features: Feature<Point, DropProperties>[] = positions.map((coordinates, i) => {
    const dropPallets = Math.min(input.palletsPerDrop, pallets - i * input.palletsPerDrop);
    const dropColonies = Math.min(coloniesLeft, dropPallets * input.coloniesPerPallet);
    coloniesLeft -= dropColonies;
    return {
      type: 'Feature',
      geometry: { type: 'Point', coordinates },
      properties: { drop: i + 1, pallets: dropPallets, colonies: dropColonies },
    };
  });
  return {
    areaHa,
    areaAcres,
    hivesPerAcre,
    colonies,
    pallets,
    drops: { type: 'FeatureCollection', features },
  };
}

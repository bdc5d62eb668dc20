import { booleanPointInPolygon } from '@turf/turf';
import * as geographiclib from 'geographiclib-geodesic';
import type { Polygon } from 'geojson';
import { describe, expect, it } from 'vitest';
import { boundaryAreaHa, boundaryProblems } from '../../../shared/domain/site-boundary';
import { computeSitePlan } from '../../../shared/domain/site-plan';
import { placeDropsInPolygon } from '../../../shared/domain/drop-placement';
import { HA_PER_ACRE } from '../../../shared/domain/units';

/** Geodesic area on WGS84 (GeographicLib), ha. */
function geodesicAreaHa(boundary: Polygon): number {
  const polygon = geographiclib.Geodesic.WGS84.Polygon(false);
  for (const [lon, lat] of boundary.coordinates[0].slice(0, -1)) polygon.AddPoint(lat, lon);
  return Math.abs(polygon.Compute(false, true).area!) / 10_000;
}

const ring = (points: [number, number][]): Polygon => ({
  type: 'Polygon',
  coordinates: [[...points, points[0]]],
});

// An almond block near Modesto shaped like a U (a concave block with a notch in the middle).
const lon0 = -120.95;
const lat0 = 37.6;
const d = 0.005;
const uBlock = ring([
  [lon0, lat0],
  [lon0 + 3 * d, lat0],
  [lon0 + 3 * d, lat0 + 3 * d],
  [lon0 + 2 * d, lat0 + 3 * d],
  [lon0 + 2 * d, lat0 + d],
  [lon0 + d, lat0 + d],
  [lon0 + d, lat0 + 3 * d],
  [lon0, lat0 + 3 * d],
]);
const notch = ring([
  [lon0 + d, lat0 + d],
  [lon0 + 2 * d, lat0 + d],
  [lon0 + 2 * d, lat0 + 3 * d],
  [lon0 + d, lat0 + 3 * d],
]);
const square = ring([
  [-97.9, 28.0],
  [-97.89, 28.0],
  [-97.89, 28.01],
  [-97.9, 28.01],
]);

describe('boundaryAreaHa vs GeographicLib', () => {
  it.each([
    ['U-shaped block, California', uBlock],
    ['square block, south Texas', square],
    [
      'large block, North Dakota',
      ring([
        [-101.9, 47.2],
        [-101.7, 47.2],
        [-101.7, 47.35],
        [-101.9, 47.35],
      ]),
    ],
  ])(
    'when %s then turf area is within 0.5 % of the WGS84 geodesic area (GeographicLib)',
    (_name, boundary) => {
      const reference = geodesicAreaHa(boundary);
      expect(Math.abs(boundaryAreaHa(boundary) - reference) / reference).toBeLessThan(0.005);
    },
  );
});

describe('boundaryProblems', () => {
  it('when a bow-tie crosses itself then it reports the crossing (turf kinks)', () => {
    const bowTie = ring([
      [0, 0],
      [1, 1],
      [1, 0],
      [0, 1],
    ]);
    expect(boundaryProblems(bowTie).join(' ')).toMatch(/crosses itself/);
  });

  it('when a ring is not closed or too short then it says so', () => {
    expect(
      boundaryProblems({
        type: 'Polygon',
        coordinates: [
          [
            [0, 0],
            [1, 0],
            [1, 1],
            [0, 1],
          ],
        ],
      }).join(' '),
    ).toMatch(/not closed/);
    expect(
      boundaryProblems({
        type: 'Polygon',
        coordinates: [
          [
            [0, 0],
            [1, 0],
            [0, 0],
          ],
        ],
      }).join(' '),
    ).toMatch(/at least 4/);
    expect(boundaryProblems({ type: 'Point', coordinates: [0, 0] }).join(' ')).toMatch(/Polygon/);
  });

  it('when the U block is valid then there are no problems', () => {
    expect(boundaryProblems(uBlock)).toEqual([]);
  });
});

describe('computeSitePlan', () => {
  it('when an almond U block then colonies = ⌈acres × 2⌉ (Almond Board of California), pallets and drops follow', () => {
    const plan = computeSitePlan({
      crop: 'almond',
      boundary: uBlock,
      coloniesPerPallet: 4,
      palletsPerDrop: 6,
    });
    expect(plan.hivesPerAcre).toBe(2);
    expect(plan.areaAcres).toBeCloseTo(plan.areaHa / HA_PER_ACRE, 9);
    expect(plan.colonies).toBe(Math.ceil(plan.areaAcres * 2));
    expect(plan.pallets).toBe(Math.ceil(plan.colonies / 4));
    expect(plan.drops.features).toHaveLength(Math.ceil(plan.pallets / 6));
    const palletsPlaced = plan.drops.features.reduce((s, f) => s + f.properties.pallets, 0);
    const coloniesPlaced = plan.drops.features.reduce((s, f) => s + f.properties.colonies, 0);
    expect(palletsPlaced).toBe(plan.pallets);
    expect(coloniesPlaced).toBe(plan.colonies);
  });

  it('when drops are placed in the U block then every drop is strictly inside and none is in the notch', () => {
    const drops = placeDropsInPolygon(uBlock, 40);
    expect(drops).toHaveLength(40);
    for (const [lon, lat] of drops) {
      expect(booleanPointInPolygon([lon, lat], uBlock, { ignoreBoundary: true })).toBe(true);
      expect(booleanPointInPolygon([lon, lat], notch)).toBe(false);
    }
  });

  it('when drops are placed then they are spread evenly: each arm gets its share and no two drops crowd', () => {
    const drops = placeDropsInPolygon(uBlock, 35);
    // The U is 7 equal cells: the bottom bar 3, each arm 2 → 10 drops per arm.
    const leftArm = drops.filter(([lon, lat]) => lat > lat0 + d && lon < lon0 + d).length;
    const rightArm = drops.filter(([lon, lat]) => lat > lat0 + d && lon > lon0 + 2 * d).length;
    expect(leftArm).toBeGreaterThanOrEqual(8);
    expect(leftArm).toBeLessThanOrEqual(12);
    expect(rightArm).toBeGreaterThanOrEqual(8);
    expect(rightArm).toBeLessThanOrEqual(12);
    const metres = (a: number[], b: number[]) =>
      Math.hypot(
        (a[0] - b[0]) * 111_320 * Math.cos((lat0 * Math.PI) / 180),
        (a[1] - b[1]) * 110_574,
      );
    const areaM2 = boundaryAreaHa(uBlock) * 10_000;
    const ideal = Math.sqrt(areaM2 / 35);
    const nearest = drops.map((a, i) =>
      Math.min(...drops.filter((_, j) => j !== i).map((b) => metres(a, b))),
    );
    expect(Math.min(...nearest)).toBeGreaterThan(0.5 * ideal);
  });

  it('when only areaHa is given then colonies are computed and there are no drops', () => {
    const plan = computeSitePlan({
      crop: 'apple',
      areaHa: 40.468564224,
      coloniesPerPallet: 4,
      palletsPerDrop: 4,
    });
    expect(plan.areaAcres).toBeCloseTo(100, 9);
    expect(plan.colonies).toBe(100); // 1 per acre (Canadian Honey Council)
    expect(plan.pallets).toBe(25);
    expect(plan.drops.features).toEqual([]);
  });

  it('when the boundary crosses itself or the crop is unknown without a rate then throws with a clear message', () => {
    const bowTie = ring([
      [0, 0],
      [0.01, 0.01],
      [0.01, 0],
      [0, 0.01],
    ]);
    expect(() =>
      computeSitePlan({
        crop: 'almond',
        boundary: bowTie,
        coloniesPerPallet: 4,
        palletsPerDrop: 4,
      }),
    ).toThrow(/crosses itself/);
    expect(() =>
      computeSitePlan({ crop: 'kiwifruit', areaHa: 10, coloniesPerPallet: 4, palletsPerDrop: 4 }),
    ).toThrow(/unknown crop/);
  });
});

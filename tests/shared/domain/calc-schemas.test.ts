import { describe, expect, it } from 'vitest';
import {
  hiveWeightRequest,
  loadPlanRequest,
  moveWindowRequest,
  sitePlanRequest,
} from '../../../shared/schemas/calc';

const paths = (result: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }) =>
  (result.error?.issues ?? []).map((i) => i.path.join('.'));

const move = {
  origin: { lat: 28.0, lon: -97.9 },
  destination: { lat: 36.6, lon: -120.3 },
  date: '2026-01-20',
  loadingMinutes: 120,
  averageSpeedKmh: 80,
};
const load = {
  colonies: 408,
  coloniesPerPallet: 4,
  palletTareKg: 20,
  hiveWeightKg: { mean: 45, sd: 4, samples: 20 },
  trucks: [{ id: 'semi-1', payloadKg: 21_000, palletSpots: 26, tiers: 4 }],
};
const square = {
  type: 'Polygon',
  coordinates: [
    [
      [-120.9, 37.6],
      [-120.89, 37.6],
      [-120.89, 37.61],
      [-120.9, 37.61],
      [-120.9, 37.6],
    ],
  ],
};

describe('calc request schemas (DESIGN.md field names)', () => {
  it('when the contract’s example bodies are sent then they parse', () => {
    expect(
      hiveWeightRequest.safeParse({ boxes: [{ size: 'deep', honeyFill: 0.5 }], includeBees: true })
        .success,
    ).toBe(true);
    expect(loadPlanRequest.safeParse(load).success).toBe(true);
    expect(moveWindowRequest.safeParse({ ...move, roadFactor: 1.3, drivers: 2 }).success).toBe(
      true,
    );
    expect(
      sitePlanRequest.safeParse({
        crop: 'almond',
        boundary: square,
        coloniesPerPallet: 4,
        palletsPerDrop: 6,
      }).success,
    ).toBe(true);
  });

  it('when latitude is 91 then the issue names origin.lat', () => {
    expect(paths(moveWindowRequest.safeParse({ ...move, origin: { lat: 91, lon: 0 } }))).toEqual([
      'origin.lat',
    ]);
  });

  it('when the date does not exist (2026-02-30) then the issue names date', () => {
    expect(paths(moveWindowRequest.safeParse({ ...move, date: '2026-02-30' }))).toEqual(['date']);
  });

  it('when the speed is 0 or drivers is 3 then the issues name those fields', () => {
    expect(paths(moveWindowRequest.safeParse({ ...move, averageSpeedKmh: 0 }))).toEqual([
      'averageSpeedKmh',
    ]);
    expect(paths(moveWindowRequest.safeParse({ ...move, drivers: 3 }))).toEqual(['drivers']);
  });

  it('when tiers is 0 or colonies is text then it is rejected without coercion', () => {
    const zeroTiers = { ...load, trucks: [{ ...load.trucks[0], tiers: 0 }] };
    expect(paths(loadPlanRequest.safeParse(zeroTiers))).toEqual(['trucks.0.tiers']);
    const text = loadPlanRequest.safeParse({ ...load, colonies: '408' });
    expect(paths(text)).toEqual(['colonies']);
    expect(text.error!.issues[0].message).toBe('Must be a number.');
  });

  it('when sd > 0 with one sample then the issue names hiveWeightKg.samples', () => {
    expect(
      paths(loadPlanRequest.safeParse({ ...load, hiveWeightKg: { mean: 45, sd: 4, samples: 1 } })),
    ).toEqual(['hiveWeightKg.samples']);
  });

  it('when the boundary crosses itself then the domain validator’s message names boundary', () => {
    const bowTie = {
      type: 'Polygon',
      coordinates: [
        [
          [0, 0],
          [1, 1],
          [1, 0],
          [0, 1],
          [0, 0],
        ],
      ],
    };
    const result = sitePlanRequest.safeParse({
      crop: 'almond',
      boundary: bowTie,
      coloniesPerPallet: 4,
      palletsPerDrop: 6,
    });
    expect(paths(result)).toEqual(['boundary']);
    expect(result.error!.issues[0].message).toMatch(/crosses itself/);
  });

  it('when the crop is unknown and no hivesPerAcre is given then the issue names crop; with a rate it parses', () => {
    expect(
      paths(
        sitePlanRequest.safeParse({
          crop: 'kiwifruit',
          areaHa: 10,
          coloniesPerPallet: 4,
          palletsPerDrop: 6,
        }),
      ),
    ).toEqual(['crop']);
    expect(
      sitePlanRequest.safeParse({
        crop: 'kiwifruit',
        areaHa: 10,
        hivesPerAcre: 3,
        coloniesPerPallet: 4,
        palletsPerDrop: 6,
      }).success,
    ).toBe(true);
  });

  it('when honey has no hivesPerAcre or neither boundary nor areaHa is given then it is rejected', () => {
    expect(
      paths(
        sitePlanRequest.safeParse({
          crop: 'honey',
          areaHa: 10,
          coloniesPerPallet: 4,
          palletsPerDrop: 6,
        }),
      ),
    ).toEqual(['hivesPerAcre']);
    expect(
      paths(sitePlanRequest.safeParse({ crop: 'almond', coloniesPerPallet: 4, palletsPerDrop: 6 })),
    ).toEqual(['boundary']);
  });

  it('when a honey fill is above 1 or a box size unknown then the issue names the box field', () => {
    expect(
      paths(hiveWeightRequest.safeParse({ boxes: [{ size: 'deep', honeyFill: 1.5 }] })),
    ).toEqual(['boxes.0.honeyFill']);
    expect(
      paths(hiveWeightRequest.safeParse({ boxes: [{ size: 'jumbo', honeyFill: 0.5 }] })),
    ).toEqual(['boxes.0.size']);
  });
});

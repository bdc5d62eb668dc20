import * as geographiclib from 'geographiclib-geodesic';
import { describe, expect, it } from 'vitest';
import { greatCircleDistanceKm, positionAlongGreatCircle } from '../../../shared/domain/distance';

const wgs84 = geographiclib.Geodesic.WGS84;

describe('greatCircleDistanceKm vs GeographicLib (WGS84 geodesic)', () => {
  it.each([
    ['south Texas → San Joaquin Valley', 28.0, -97.9, 36.6, -120.3],
    ['Modesto → Wenatchee', 37.64, -120.99, 47.42, -120.31],
    ['Wenatchee → Beulah', 47.42, -120.31, 47.26, -101.78],
    ['Beulah → south Texas', 47.26, -101.78, 28.0, -97.9],
    ['Mildura → Adelaide', -34.2, 142.15, -34.93, 138.6],
  ])(
    'when %s then within 0.5 % of the geodesic (GeographicLib)',
    (_name, lat1, lon1, lat2, lon2) => {
      const reference = wgs84.Inverse(lat1, lon1, lat2, lon2).s12! / 1000;
      const km = greatCircleDistanceKm({ lat: lat1, lon: lon1 }, { lat: lat2, lon: lon2 });
      expect(Math.abs(km - reference) / reference).toBeLessThan(0.005);
    },
  );

  it('when halfway along then the position is equidistant from both ends', () => {
    const a = { lat: 28.0, lon: -97.9 };
    const b = { lat: 36.6, lon: -120.3 };
    const mid = positionAlongGreatCircle(a, b, 0.5);
    expect(greatCircleDistanceKm(a, mid)).toBeCloseTo(greatCircleDistanceKm(mid, b), 0);
  });
});

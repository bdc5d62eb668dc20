import { describe, expect, it } from 'vitest';
import {
  computeWinterFeed,
  estimatedStoresKg,
  winterStoresNeededKg,
} from '../../../shared/domain/winter-stores';
import { kgToPounds, poundsToKg } from '../../../shared/domain/units';

describe('winterStoresNeededKg', () => {
  it('when in the deep south then about 60 lb; in the far north about 180 lb (REFERENCES.md, common practice, no source)', () => {
    expect(kgToPounds(winterStoresNeededKg(28))).toBeCloseTo(60, 9);
    expect(kgToPounds(winterStoresNeededKg(53))).toBeCloseTo(180, 9);
  });

  it('when going north then the need never falls, and southern latitudes mirror northern ones', () => {
    let previous = 0;
    for (let lat = 0; lat <= 70; lat += 1) {
      const need = winterStoresNeededKg(lat);
      expect(need).toBeGreaterThanOrEqual(previous);
      previous = need;
    }
    expect(winterStoresNeededKg(-42)).toBe(winterStoresNeededKg(42));
  });

  it('when the bands are edited then the edited figure is used', () => {
    expect(winterStoresNeededKg(47, [{ fromLatitude: 0, storesKg: 50 }])).toBe(50);
  });
});

describe('computeWinterFeed', () => {
  it('when a two-deep hive weighs 150 lb at 47°N then it needs 160 − (150 − 28 − 10 − 4.8) = 52.8 lb of honey-equivalent feed', () => {
    const feed = computeWinterFeed({
      latitude: 47.3,
      meanHiveWeightKg: poundsToKg(150),
      boxes: ['deep', 'deep'],
      colonies: 200,
    });
    expect(kgToPounds(feed.storesEstimatedKg)).toBeCloseTo(107.2, 9);
    expect(kgToPounds(feed.feedPerColonyKg)).toBeCloseTo(52.8, 9);
    expect(feed.feedForYardKg).toBeCloseTo(feed.feedPerColonyKg * 200, 9);
    expect(feed.syrup2to1PerColonyKg).toBeCloseTo((feed.feedPerColonyKg * 0.82 * 3) / 2, 9);
  });

  it('when the hive already holds enough then no feed is needed', () => {
    const feed = computeWinterFeed({
      latitude: 28,
      meanHiveWeightKg: poundsToKg(150),
      boxes: ['deep', 'deep'],
      colonies: 10,
    });
    expect(feed.feedPerColonyKg).toBe(0);
  });

  it('when the weight is below the equipment then stores are 0, not negative', () => {
    expect(estimatedStoresKg(5, ['deep'])).toBe(0);
  });
});

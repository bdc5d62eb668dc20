import { describe, expect, it } from 'vitest';
import { CROPS, CROP_KEYS, listCrops, resolveHivesPerAcre } from '../../../shared/domain/crops';

describe('crops table', () => {
  it('when listed then the keys are exactly the API contract’s (DESIGN.md)', () => {
    expect(listCrops().map((c) => c.key)).toEqual([
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
    ]);
  });

  it.each([
    ['almond', 2, 1, 3, /Almond Board/],
    ['apple', 1, 1, 2.5, /Canadian Honey Council/],
    ['pear', 1, 0.8, 1.6, /OMAFRA/],
    ['cherry', 2, 2, 3, /Good Fruit Grower/],
    ['blueberry', 3, 3, 4, /Oregon Blueberry/],
    ['cranberry', 2, 2, 3, /Nova Scotia/],
    ['cucumber', 1, 1, 1, /NC State/],
    ['watermelon', 1, 1, 1.6, /Clemson/],
    ['squash', 1, 1, 2, /Penn State/],
    ['canola', 1, 1, 2, /Canadian Honey Council/],
    ['avocado', 2, 0.8, 4, /McGregor/],
  ] as const)(
    'when %s then default %s in %s–%s per acre with its REFERENCES.md source',
    (key, rate, min, max, source) => {
      const crop = CROPS[key];
      expect(crop.hivesPerAcre).toBe(rate);
      expect(crop.range).toEqual({ min, max });
      expect(crop.source).toMatch(source);
      expect(crop.evidence).toBe('source');
    },
  );

  it('when any crop has a rate then its default lies inside its range', () => {
    for (const key of CROP_KEYS) {
      const { hivesPerAcre, range } = CROPS[key];
      if (hivesPerAcre === null) continue;
      expect(hivesPerAcre).toBeGreaterThanOrEqual(range!.min);
      expect(hivesPerAcre).toBeLessThanOrEqual(range!.max);
    }
  });

  it('when alfalfa seed or sunflower then the figures are marked from memory', () => {
    expect(CROPS['alfalfa-seed'].evidence).toBe('memory');
    expect(CROPS.sunflower.evidence).toBe('memory');
  });

  it('when honey (nectar flow) then there is no stocking rate and a rate must be given', () => {
    expect(CROPS.honey.hivesPerAcre).toBeNull();
    expect(() => resolveHivesPerAcre('honey')).toThrow(/no stocking rate/);
    expect(resolveHivesPerAcre('honey', 0.5)).toBe(0.5);
  });

  it('when the crop is unknown and no rate is given then throws; with a rate then uses it', () => {
    expect(() => resolveHivesPerAcre('kiwifruit')).toThrow(/unknown crop "kiwifruit"/);
    expect(resolveHivesPerAcre('kiwifruit', 3)).toBe(3);
  });
});

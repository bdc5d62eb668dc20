import { describe, expect, it } from 'vitest';
import { computeHiveWeight, summariseWeightSamples } from '../../../shared/domain/hive-weight';
import { kgToPounds } from '../../../shared/domain/units';

const boxOnly = { includeBees: false, includeFloorAndLid: false };

describe('computeHiveWeight', () => {
  // REFERENCES.md, Weights — common practice, no source.
  it('when one deep box is full of honey then it weighs 80–90 lb (common practice, no source)', () => {
    const lb = kgToPounds(
      computeHiveWeight({ boxes: [{ size: 'deep', honeyFill: 1 }], ...boxOnly }).weightKg,
    );
    expect(lb).toBeGreaterThanOrEqual(80);
    expect(lb).toBeLessThanOrEqual(90);
  });

  it('when one medium box is full of honey then it weighs 50–60 lb (common practice, no source)', () => {
    const lb = kgToPounds(
      computeHiveWeight({ boxes: [{ size: 'medium', honeyFill: 1 }], ...boxOnly }).weightKg,
    );
    expect(lb).toBeGreaterThanOrEqual(50);
    expect(lb).toBeLessThanOrEqual(60);
  });

  it('when one shallow box is full of honey then it weighs about 40 lb (common practice, no source)', () => {
    const lb = kgToPounds(
      computeHiveWeight({ boxes: [{ size: 'shallow', honeyFill: 1 }], ...boxOnly }).weightKg,
    );
    expect(lb).toBeGreaterThanOrEqual(36);
    expect(lb).toBeLessThanOrEqual(44);
  });

  it.each([0.25, 0.5, 1])(
    'when a one-story hive (one deep, fill %s) is compared with a two-story (two deeps) then it is about half (common practice, no source)',
    (honeyFill) => {
      const one = computeHiveWeight({ boxes: [{ size: 'deep', honeyFill }] }).weightKg;
      const two = computeHiveWeight({
        boxes: [
          { size: 'deep', honeyFill },
          { size: 'deep', honeyFill },
        ],
      }).weightKg;
      expect(one / two).toBeGreaterThan(0.45);
      expect(one / two).toBeLessThan(0.62);
    },
  );

  it('when bees and floor/lid are included then the parts add up to the total', () => {
    const result = computeHiveWeight({
      boxes: [
        { size: 'deep', honeyFill: 0.5 },
        { size: 'shallow', honeyFill: 0 },
      ],
    });
    const { equipmentKg, honeyKg, beesKg, floorAndLidKg } = result.parts;
    expect(beesKg).toBeGreaterThan(0);
    expect(floorAndLidKg).toBeGreaterThan(0);
    expect(equipmentKg + honeyKg + beesKg + floorAndLidKg).toBeCloseTo(result.weightKg, 12);
  });

  it('when 8 frames of bees then the bees weigh 19,200 bees ÷ 4,000 per lb = 4.8 lb (PNW 623 bees per frame; bees per lb from memory)', () => {
    const { parts } = computeHiveWeight({
      boxes: [{ size: 'deep', honeyFill: 0 }],
      framesOfBees: 8,
    });
    expect(kgToPounds(parts.beesKg)).toBeCloseTo(4.8, 10);
  });

  it('when honeyFill is outside 0..1 or the size is unknown then throws naming the field', () => {
    expect(() => computeHiveWeight({ boxes: [{ size: 'deep', honeyFill: 1.2 }] })).toThrow(
      /boxes\[0\]\.honeyFill.*1\.2/,
    );
    expect(() => computeHiveWeight({ boxes: [{ size: 'jumbo' as 'deep', honeyFill: 0 }] })).toThrow(
      TypeError,
    );
    expect(() => computeHiveWeight({ boxes: [] })).toThrow(RangeError);
  });
});

describe('summariseWeightSamples', () => {
  it('when given scale weights then returns mean, sample sd and count', () => {
    const summary = summariseWeightSamples([40, 42, 44, 46]);
    expect(summary).toEqual({ mean: 43, sd: expect.closeTo(Math.sqrt(20 / 3), 12), samples: 4 });
  });

  it('when given a single weight then throws (no spread can be estimated)', () => {
    expect(() => summariseWeightSamples([40])).toThrow(/at least 2/);
  });
});

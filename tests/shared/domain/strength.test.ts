import { describe, expect, it } from 'vitest';
import {
  inspectionSampleSize,
  sampleSizeForMargin,
  summariseStrength,
} from '../../../shared/domain/strength';

describe('summariseStrength', () => {
  // An 8-frame average with a 6-frame minimum is the common almond standard (Almond Board of California).
  const frames = [8, 9, 7, 6, 10, 5, 8, 9, 7, 8];

  it('when 10 colonies are inspected then the mean, its t interval (t(0.975, 9) = 2.262, NIST table) and the share ≥ 6 are given', () => {
    const s = summariseStrength(frames, 6);
    expect(s.meanFrames).toBeCloseTo(7.7, 12);
    const sd = Math.sqrt(frames.reduce((a, f) => a + (f - 7.7) ** 2, 0) / 9);
    expect(s.sdFrames).toBeCloseTo(sd, 12);
    expect(s.meanInterval.upper - s.meanFrames).toBeCloseTo((2.262 * sd) / Math.sqrt(10), 3);
    expect(s.atOrAboveMinimum).toBe(9);
    expect(s.shareAtOrAboveMinimum).toBe(0.9);
    // Wilson 95 % for 9/10: (0.596, 0.982), hand-computed from Wilson (1927).
    expect(s.shareInterval.lower).toBeCloseTo(0.596, 3);
    expect(s.shareInterval.upper).toBeCloseTo(0.982, 3);
  });

  it('when fewer than 2 colonies then throws', () => {
    expect(() => summariseStrength([8], 6)).toThrow(/at least 2/);
  });
});

describe('sample sizes', () => {
  it('when sd 2 frames and margin ±0.5 at 95 % then n = ⌈(1.96·2/0.5)²⌉ = 62 (Cochran 1977, eq. 4.1)', () => {
    expect(sampleSizeForMargin(2, 0.5)).toBe(62);
  });

  it('when the drop holds 400 colonies then the finite population correction gives 54 (Cochran 1977, eq. 4.2)', () => {
    expect(sampleSizeForMargin(2, 0.5, 0.95, 400)).toBe(54);
  });

  it('when a load of 408 colonies is inspected at 10 % then 41 are opened (PNW 623)', () => {
    expect(inspectionSampleSize(408)).toBe(41);
    expect(inspectionSampleSize(5)).toBe(1);
    expect(inspectionSampleSize(0)).toBe(0);
  });
});

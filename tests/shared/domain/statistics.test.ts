import { describe, expect, it } from 'vitest';
import {
  mean,
  meanConfidenceInterval,
  normalCdf,
  normalQuantile,
  regularizedIncompleteBeta,
  sampleStandardDeviation,
  studentTQuantile,
  wilsonInterval,
} from '../../../shared/domain/statistics';

describe('studentTQuantile', () => {
  // Published one-sided 0.95 t table (e.g. NIST/SEMATECH e-Handbook §1.3.6.7.2).
  it.each([
    [1, 6.314],
    [2, 2.92],
    [5, 2.015],
    [10, 1.812],
    [30, 1.697],
    [120, 1.658],
    [Infinity, 1.645],
  ])('when df = %s then t(0.95) matches the NIST t table (%s)', (df, expected) => {
    expect(studentTQuantile(0.95, df)).toBeCloseTo(expected, 3);
  });

  it('when p = 0.975 and df = 9 then gives 2.262 (NIST t table)', () => {
    expect(studentTQuantile(0.975, 9)).toBeCloseTo(2.262, 3);
  });

  it('when p < 0.5 then the quantile is the negative of the upper one (symmetry)', () => {
    expect(studentTQuantile(0.05, 4)).toBeCloseTo(-studentTQuantile(0.95, 4), 10);
  });

  it('when df < 1 or p outside (0,1) then throws a RangeError naming the value', () => {
    expect(() => studentTQuantile(0.95, 0)).toThrow(/degreesOfFreedom.*0/);
    expect(() => studentTQuantile(1, 5)).toThrow(RangeError);
  });
});

describe('normal distribution', () => {
  it('when p = 0.975 then Φ⁻¹ = 1.959964 (Abramowitz & Stegun table 26.5)', () => {
    expect(normalQuantile(0.975)).toBeCloseTo(1.959964, 6);
    expect(normalQuantile(0.001)).toBeCloseTo(-3.090232, 6);
  });

  it('when z = 1 then Φ = 0.841345 (A&S table 26.1)', () => {
    expect(normalCdf(1)).toBeCloseTo(0.841345, 6);
    expect(normalCdf(-1)).toBeCloseTo(0.158655, 6);
  });

  it('when I_x(a, 1) then equals x^a (closed form of the incomplete beta)', () => {
    expect(regularizedIncompleteBeta(0.3, 2.5, 1)).toBeCloseTo(0.3 ** 2.5, 10);
  });
});

describe('intervals', () => {
  it('when 9 of 10 succeed then the 95 % Wilson interval is (0.596, 0.982) (Wilson 1927 formula, hand-computed)', () => {
    const interval = wilsonInterval(9, 10);
    expect(interval.lower).toBeCloseTo(0.596, 3);
    expect(interval.upper).toBeCloseTo(0.982, 3);
  });

  it('when 0 of 20 succeed then the Wilson interval starts at 0 and is not degenerate', () => {
    const interval = wilsonInterval(0, 20);
    expect(interval.lower).toBe(0);
    expect(interval.upper).toBeCloseTo(0.161, 3);
  });

  it('when mean 10, sd 2, n 10 then the t interval is 10 ± 2.262·2/√10', () => {
    const interval = meanConfidenceInterval(10, 2, 10);
    expect(interval.upper - 10).toBeCloseTo((2.262 * 2) / Math.sqrt(10), 3);
  });

  it('when summarising values then mean and sample sd use n − 1', () => {
    expect(mean([2, 4, 4, 4, 5, 5, 7, 9])).toBe(5);
    expect(sampleStandardDeviation([2, 4, 4, 4, 5, 5, 7, 9])).toBeCloseTo(Math.sqrt(32 / 7), 12);
    expect(() => sampleStandardDeviation([1])).toThrow(/at least 2/);
  });
});

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { apportion } from '../../../shared/domain/apportion';

describe('apportion', () => {
  it('when 10 is split over 1:1:1 then the first remainder wins: 4, 3, 3', () => {
    expect(apportion(10, [1, 1, 1])).toEqual([4, 3, 3]);
  });

  it('when the Hamilton worked example (total 10, weights 5:3:2 of 10) is split then it is exact', () => {
    expect(apportion(10, [5, 3, 2])).toEqual([5, 3, 2]);
    // 7 over 5:3:2 → exact 3.5, 2.1, 1.4 → floors 3, 2, 1 and the one left goes to the largest remainder (3.5).
    expect(apportion(7, [5, 3, 2])).toEqual([4, 2, 1]);
  });

  it('when a weight is 0 then its part is 0', () => {
    expect(apportion(5, [0, 2, 3])).toEqual([0, 2, 3]);
  });

  it('when split at random then the parts sum to the total and each is within one of its exact share (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.nat(10_000),
        fc
          .array(fc.nat(1_000), { minLength: 1, maxLength: 12 })
          .filter((w) => w.some((x) => x > 0)),
        (total, weights) => {
          const parts = apportion(total, weights);
          const sum = weights.reduce((a, b) => a + b, 0);
          expect(parts.reduce((a, b) => a + b, 0)).toBe(total);
          parts.forEach((p, i) => expect(Math.abs(p - (total * weights[i]) / sum)).toBeLessThan(1));
        },
      ),
    );
  });

  it('when every weight is 0 but there is something to split then it refuses', () => {
    expect(() => apportion(3, [0, 0])).toThrow(RangeError);
  });
});

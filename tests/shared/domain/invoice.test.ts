import { describe, expect, it } from 'vitest';
import { computeInvoice, roundHalfAwayFromZero } from '../../../shared/domain/invoice';

describe('roundHalfAwayFromZero', () => {
  it('when exactly half then rounds away from zero, both signs', () => {
    expect(roundHalfAwayFromZero(2.5)).toBe(3);
    expect(roundHalfAwayFromZero(-2.5)).toBe(-3);
    expect(roundHalfAwayFromZero(2.4999)).toBe(2);
    expect(roundHalfAwayFromZero(-0.4)).toBe(0);
  });

  it('when binary floating point hides a half (1.005 × 100) then it still rounds up', () => {
    expect(roundHalfAwayFromZero(1.005 * 100)).toBe(101);
  });
});

describe('computeInvoice', () => {
  // Fee from USDA NASS "Cost of Pollination" (Dec 2023): almond $194 per colony in 2022.
  it('when 408 colonies at $194 with a $20,000 deposit then the balance is $59,152', () => {
    const invoice = computeInvoice({
      coloniesPlaced: 408,
      feePerColonyCents: 19_400,
      depositPaidCents: 2_000_000,
    });
    expect(invoice.feeCents).toBe(7_915_200);
    expect(invoice.totalCents).toBe(7_915_200);
    expect(invoice.balanceCents).toBe(5_915_200);
  });

  it('when the average is 7.5 frames against an 8-frame target at $5 per frame then the fee is reduced by 408 × 0.5 × $5', () => {
    const invoice = computeInvoice({
      coloniesPlaced: 408,
      feePerColonyCents: 19_400,
      strength: {
        targetAverageFrames: 8,
        measuredAverageFrames: 7.5,
        perFramePerColonyCents: 500,
        coloniesBelowMinimum: 10,
        belowMinimumReductionCents: 2_000,
      },
    });
    expect(invoice.lines.map((l) => [l.kind, l.amountCents])).toEqual([
      ['fee', 7_915_200],
      ['strength-adjustment', -102_000],
      ['below-minimum', -20_000],
    ]);
    expect(invoice.totalCents).toBe(7_915_200 - 122_000);
  });

  it('when the adjustment has a fraction of a cent then it is rounded half away from zero, once', () => {
    const invoice = computeInvoice({
      coloniesPlaced: 3,
      feePerColonyCents: 10_000,
      strength: {
        targetAverageFrames: 8,
        measuredAverageFrames: 8 + 1 / 6,
        perFramePerColonyCents: 1,
      },
    });
    expect(invoice.adjustmentsCents).toBe(1); // 3 × 1/6 × 1 = 0.5 cent → 1
  });

  it('when reductionsOnly and the bees are stronger than the target then no bonus is added', () => {
    const invoice = computeInvoice({
      coloniesPlaced: 100,
      feePerColonyCents: 19_400,
      strength: {
        targetAverageFrames: 8,
        measuredAverageFrames: 10,
        perFramePerColonyCents: 500,
        reductionsOnly: true,
      },
    });
    expect(invoice.adjustmentsCents).toBe(0);
  });

  it('when a fee is not whole cents then throws naming it', () => {
    expect(() => computeInvoice({ coloniesPlaced: 1, feePerColonyCents: 10.5 })).toThrow(
      /feePerColonyCents.*10\.5/,
    );
  });
});

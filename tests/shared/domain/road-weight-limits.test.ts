import { describe, expect, it } from 'vitest';
import {
  bridgeFormulaMaxLb,
  grossWeightCheck,
  INTERSTATE_GROSS_LIMIT_KG,
} from '../../../shared/domain/road-weight-limits';
import { poundsToKg } from '../../../shared/domain/units';

describe('bridgeFormulaMaxLb (23 CFR 658.17)', () => {
  it('when 5 axles span 51 ft then W = 80,000 lb (23 CFR 658.17 example, REFERENCES.md)', () => {
    expect(bridgeFormulaMaxLb(5, 51)).toBe(80_000);
  });

  it.each([
    [2, 4, 34_000],
    [3, 10, 43_500],
    [4, 40, 68_500],
    [5, 36, 70_500],
  ])('when %s axles span %s ft then W = %s lb (FHWA Bridge Formula Weights table)', (n, l, w) => {
    expect(bridgeFormulaMaxLb(n, l)).toBe(w);
  });

  it('when fewer than 2 axles then throws naming the value', () => {
    expect(() => bridgeFormulaMaxLb(1, 10)).toThrow(/axleCount.*1/);
  });
});

describe('grossWeightCheck', () => {
  it('when no limit is given then the 80,000 lb Interstate limit applies (23 CFR 658.17(b))', () => {
    expect(INTERSTATE_GROSS_LIMIT_KG).toBeCloseTo(36_287.3896, 4);
    const check = grossWeightCheck({ truckTareKg: 14_000, loadKg: 22_000 });
    expect(check).toMatchObject({ grossKg: 36_000, withinLimit: true });
    expect(check.marginKg).toBeCloseTo(287.3896, 4);
  });

  it('when the load is too heavy or a state limit is lower then withinLimit is false', () => {
    expect(grossWeightCheck({ truckTareKg: 15_000, loadKg: 22_000 }).withinLimit).toBe(false);
    expect(
      grossWeightCheck({ truckTareKg: 14_000, loadKg: 20_000, legalGrossKg: poundsToKg(73_280) })
        .withinLimit,
    ).toBe(false);
  });
});

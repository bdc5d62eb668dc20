/**
 * US federal truck weight limits: the Interstate gross limit and the bridge formula
 * (23 CFR 658.17, FHWA "Bridge Formula Weights").
 */
import { assertInRange, assertInteger } from './guards';
import { poundsToKg } from './units';

/** Maximum gross vehicle weight on the Interstate: 80,000 lb (23 CFR 658.17(b)). */
export const INTERSTATE_GROSS_LIMIT_LB = 80_000;

/** The same limit in kilograms (80,000 × 0.45359237 = 36,287.39 kg). */
export const INTERSTATE_GROSS_LIMIT_KG = poundsToKg(INTERSTATE_GROSS_LIMIT_LB);

/** Single-axle limit: 20,000 lb (23 CFR 658.17(c)). */
export const SINGLE_AXLE_LIMIT_LB = 20_000;

/** Tandem-axle limit: 34,000 lb (23 CFR 658.17(d)). */
export const TANDEM_AXLE_LIMIT_LB = 34_000;

/**
 * Bridge formula, 23 CFR 658.17(e): W = 500 [LN/(N − 1) + 12N + 36], rounded to the nearest
 * 500 lb, where L is the distance in feet between the outer axles of the group and N the number
 * of axles. E.g. N = 5, L = 51 ft → 79,875 → 80,000 lb. The rule's exception for two tandems
 * 36–38 ft apart (34,000 lb each) is not applied here.
 */
export function bridgeFormulaMaxLb(axleCount: number, lengthFt: number): number {
  assertInteger('axleCount', axleCount, 2);
  assertInRange('lengthFt', lengthFt, Number.MIN_VALUE);
  const exact = 500 * ((lengthFt * axleCount) / (axleCount - 1) + 12 * axleCount + 36);
  return Math.round(exact / 500) * 500;
}

/** Input of grossWeightCheck (kg). */
export interface GrossWeightCheckInput {
  /** Empty truck and trailer, kg. */
  truckTareKg: number;
  /** Load (usually its upper bound), kg. */
  loadKg: number;
  /** Legal gross limit, kg; default 80,000 lb. */
  legalGrossKg?: number;
}

/** Result of grossWeightCheck (kg). */
export interface GrossWeightCheck {
  /** Truck tare + load, kg. */
  grossKg: number;
  /** The limit applied, kg. */
  legalGrossKg: number;
  /** Limit − gross, kg (negative when over). */
  marginKg: number;
  /** True when gross ≤ limit. */
  withinLimit: boolean;
}

/** Checks truck tare + load against the legal gross weight (80,000 lb by default). */
export function grossWeightCheck(input: GrossWeightCheckInput): GrossWeightCheck {
  const { truckTareKg, loadKg, legalGrossKg = INTERSTATE_GROSS_LIMIT_KG } = input;
  assertInRange('truckTareKg', truckTareKg, 0);
  assertInRange('loadKg', loadKg, 0);
  assertInRange('legalGrossKg', legalGrossKg, Number.MIN_VALUE);
  const grossKg = truckTareKg + loadKg;
  return {
    grossKg,
    legalGrossKg,
    marginKg: legalGrossKg - grossKg,
    withinLimit: grossKg <= legalGrossKg,
  };
}

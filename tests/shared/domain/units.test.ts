import { describe, expect, it } from 'vitest';
import {
  acresToHa,
  celsiusToFahrenheit,
  fahrenheitToCelsius,
  haToAcres,
  kgToPounds,
  kmToMiles,
  milesToKm,
  poundsToKg,
} from '../../../shared/domain/units';

// Exact definitions: NIST SP 811 / Handbook 44 App. C; REFERENCES.md "Distance, area, time zones".
describe('unit conversions', () => {
  it('when converting 1 lb then gives exactly 0.45359237 kg (international pound, NIST SP 811)', () => {
    expect(poundsToKg(1)).toBe(0.45359237);
    expect(poundsToKg(80_000)).toBeCloseTo(36_287.3896, 6);
  });

  it('when converting 1 acre then gives exactly 0.40468564224 ha (REFERENCES.md)', () => {
    expect(acresToHa(1)).toBe(0.40468564224);
    expect(haToAcres(0.40468564224)).toBe(1);
    expect(haToAcres(100)).toBeCloseTo(247.105381, 6);
  });

  it('when converting 1 mile then gives exactly 1.609344 km (REFERENCES.md)', () => {
    expect(milesToKm(1)).toBe(1.609344);
    expect(kmToMiles(1.609344)).toBe(1);
  });

  it('when converting kg back to lb then round-trips', () => {
    expect(kgToPounds(poundsToKg(180))).toBeCloseTo(180, 12);
  });

  it('when converting temperatures then the fixed points of water hold (definition of °F)', () => {
    expect(fahrenheitToCelsius(32)).toBe(0);
    expect(fahrenheitToCelsius(212)).toBe(100);
    expect(celsiusToFahrenheit(-40)).toBe(-40);
    // REFERENCES.md: few bees fly below about 55 °F (WSU Tree Fruit) ≈ 12.8 °C
    expect(fahrenheitToCelsius(55)).toBeCloseTo(12.78, 2);
  });
});

/**
 * Exact unit conversions. Every factor here is a defined value, not a measurement:
 * the international pound (1959) is 0.45359237 kg, the international mile is 1,609.344 m,
 * the international acre is 4,046.8564224 m² (NIST Handbook 44, Appendix C; NIST SP 811).
 */

/** Kilograms in one international avoirdupois pound (exact, NIST SP 811). */
export const KG_PER_LB = 0.45359237;

/** Hectares in one international acre (exact: 4,046.8564224 m², NIST SP 811). */
export const HA_PER_ACRE = 0.40468564224;

/** Kilometres in one international statute mile (exact, NIST SP 811). */
export const KM_PER_MILE = 1.609344;

/** Square metres in one hectare. */
export const M2_PER_HA = 10_000;

/** Converts pounds to kilograms. */
export function poundsToKg(weightLb: number): number {
  return weightLb * KG_PER_LB;
}

/** Converts kilograms to pounds. */
export function kgToPounds(weightKg: number): number {
  return weightKg / KG_PER_LB;
}

/** Converts acres to hectares. */
export function acresToHa(areaAcres: number): number {
  return areaAcres * HA_PER_ACRE;
}

/** Converts hectares to acres. */
export function haToAcres(areaHa: number): number {
  return areaHa / HA_PER_ACRE;
}

/** Converts square metres to hectares. */
export function squareMetresToHa(areaM2: number): number {
  return areaM2 / M2_PER_HA;
}

/** Converts statute miles to kilometres. */
export function milesToKm(distanceMiles: number): number {
  return distanceMiles * KM_PER_MILE;
}

/** Converts kilometres to statute miles. */
export function kmToMiles(distanceKm: number): number {
  return distanceKm / KM_PER_MILE;
}

/** Converts degrees Fahrenheit to degrees Celsius (°C = (°F − 32) × 5/9). */
export function fahrenheitToCelsius(temperatureF: number): number {
  return ((temperatureF - 32) * 5) / 9;
}

/** Converts degrees Celsius to degrees Fahrenheit (°F = °C × 9/5 + 32). */
export function celsiusToFahrenheit(temperatureC: number): number {
  return (temperatureC * 9) / 5 + 32;
}

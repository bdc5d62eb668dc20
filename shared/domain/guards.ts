/**
 * Input guards shared by the domain functions. The API validates with zod first; these throw
 * when a caller inside the code base passes something impossible, naming the bad value.
 */

/** Throws a TypeError unless `value` is a finite number. */
export function assertFiniteNumber(name: string, value: unknown): asserts value is number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new TypeError(`${name} must be a finite number, got ${String(value)}`);
  }
}

/** Throws unless `value` is a finite number ≥ `min` (and ≤ `max` when given). */
export function assertInRange(name: string, value: unknown, min: number, max = Infinity): void {
  assertFiniteNumber(name, value);
  if (value < min || value > max) {
    const range = max === Infinity ? `≥ ${min}` : `between ${min} and ${max}`;
    throw new RangeError(`${name} must be ${range}, got ${value}`);
  }
}

/** Throws unless `value` is a finite number strictly greater than zero. */
export function assertPositive(name: string, value: unknown): void {
  assertFiniteNumber(name, value);
  if (value <= 0) throw new RangeError(`${name} must be greater than 0, got ${value}`);
}

/** Throws unless `value` is an integer ≥ `min` (and ≤ `max` when given). */
export function assertInteger(name: string, value: unknown, min: number, max = Infinity): void {
  if (typeof value !== 'number' || !Number.isInteger(value)) {
    throw new TypeError(`${name} must be an integer, got ${String(value)}`);
  }
  assertInRange(name, value, min, max);
}

/** Throws unless (lat, lon) is a valid WGS84 position in degrees. */
export function assertLatLon(name: string, lat: unknown, lon: unknown): void {
  assertInRange(`${name} latitude`, lat, -90, 90);
  assertInRange(`${name} longitude`, lon, -180, 180);
}

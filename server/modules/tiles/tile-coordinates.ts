import type { FieldIssue } from '../../../shared/api/errors';
import { AppError } from '../../errors/app-error';

/** Deepest zoom the tile service answers; clients over-zoom beyond it. */
export const maxTileZoom = 14;

/** A tile address in the XYZ (slippy map) scheme: y counts down from the north. */
export interface TileAddress {
  z: number;
  x: number;
  y: number;
}

const wholeNumber = /^\d{1,9}$/;

/**
 * Reads z, x and y from the URL or answers 400 naming each bad one: whole numbers, z at most
 * `maxTileZoom`, x and y below 2^z.
 */
export function parseTileAddress(raw: { z?: string; x?: string; y?: string }): TileAddress {
  const issues: FieldIssue[] = [];
  const whole = (field: 'z' | 'x' | 'y') => {
    const text = raw[field] ?? '';
    if (!wholeNumber.test(text)) {
      issues.push({ field, message: `Must be a whole number, got "${text.slice(0, 20)}".` });
      return null;
    }
    return Number(text);
  };
  const z = whole('z');
  const x = whole('x');
  const y = whole('y');
  if (z !== null && z > maxTileZoom)
    issues.push({ field: 'z', message: `Zoom is 0 to ${maxTileZoom}, got ${z}.` });
  if (z !== null && z <= maxTileZoom) {
    const size = 2 ** z;
    if (x !== null && x >= size)
      issues.push({ field: 'x', message: `At zoom ${z}, x is 0 to ${size - 1}, got ${x}.` });
    if (y !== null && y >= size)
      issues.push({ field: 'y', message: `At zoom ${z}, y is 0 to ${size - 1}, got ${y}.` });
  }
  if (issues.length > 0 || z === null || x === null || y === null)
    throw AppError.validation(issues, 'No such tile: check z, x and y.');
  return { z, x, y };
}

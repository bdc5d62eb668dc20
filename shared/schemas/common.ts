import { z } from 'zod';

/** A record id (UUID). */
export const id = z.uuid({ message: 'Must be a record id (UUID).' });

/** A calendar date `YYYY-MM-DD` that exists (2026-02-30 does not). */
export const calendarDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Use the form YYYY-MM-DD.')
  .refine((value) => {
    const [y, m, d] = value.split('-').map(Number);
    const date = new Date(Date.UTC(y, m - 1, d));
    return date.getUTCFullYear() === y && date.getUTCMonth() === m - 1 && date.getUTCDate() === d;
  }, 'This date does not exist.');

/** Free text with no NUL characters and a length cap. */
export const text = (max: number) =>
  z
    .string()
    .max(max, `At most ${max} characters.`)
    .refine((value) => !value.includes('\u0000'), 'Must not contain NUL characters.');

/** A required name: trimmed, 1–120 characters. */
export const name = text(120).trim().min(1, 'Required.');

export const latitude = z
  .number()
  .min(-90, 'Latitude is between -90 and 90.')
  .max(90, 'Latitude is between -90 and 90.');
export const longitude = z
  .number()
  .min(-180, 'Longitude is between -180 and 180.')
  .max(180, 'Longitude is between -180 and 180.');

/** The version a client read; an update at a stale version is refused with 409. */
export const version = z.number().int().min(1);

/** Pagination shared by every list: `?limit=50&offset=0`. */
export const pagination = {
  limit: z.coerce.number().int().min(1).max(500).default(50),
  offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
};

/** `?archived=true` includes archived records in a list. */
export const includeArchived = z
  .enum(['true', 'false'])
  .default('false')
  .transform((v) => v === 'true');

export const sortOrder = z.enum(['asc', 'desc']).default('asc');

/** Archive request body: the version the client read. */
export const archiveRequest = z.strictObject({ version });

/** Every list answers `{ items, total }`. */
export interface ListResult<T> {
  items: T[];
  total: number;
}

import { CROP_KEYS, type CropKey } from '../domain/crops';
import { z } from 'zod';
import { polygon } from './geojson';
import {
  calendarDate,
  id,
  includeArchived,
  latitude,
  longitude,
  name,
  pagination,
  sortOrder,
  text,
  version,
} from './common';

export const siteKinds = ['orchard', 'seed-field', 'honey'] as const;
export type SiteKind = (typeof siteKinds)[number];

/** Crop keys, lower-case English, as GET /api/crops lists them. */
export const cropKeys = CROP_KEYS;
export type { CropKey };

export const siteFields = z.strictObject({
  growerId: id.nullish(),
  name,
  kind: z.enum(siteKinds),
  crop: z.enum(cropKeys),
  boundary: polygon.nullish(),
  latitude: latitude.optional(),
  longitude: longitude.optional(),
  bloomStartOn: calendarDate.nullish(),
  bloomEndOn: calendarDate.nullish(),
  accessNotes: text(2000).optional(),
  notes: text(4000).optional(),
});

const pointOrBoundary = (s: { boundary?: unknown; latitude?: number; longitude?: number }) =>
  Boolean(s.boundary) || (s.latitude !== undefined && s.longitude !== undefined);
const bloomInOrder = (s: { bloomStartOn?: string | null; bloomEndOn?: string | null }) =>
  !s.bloomStartOn || !s.bloomEndOn || s.bloomStartOn <= s.bloomEndOn;

export const siteCreateRequest = siteFields
  .refine(pointOrBoundary, {
    path: ['boundary'],
    message: 'Give a boundary or a point (latitude and longitude).',
  })
  .refine(bloomInOrder, { path: ['bloomEndOn'], message: 'Bloom ends on or after it starts.' });
export const siteUpdateRequest = siteFields
  .partial()
  .extend({ version })
  .refine(bloomInOrder, { path: ['bloomEndOn'], message: 'Bloom ends on or after it starts.' });

export const siteListQuery = z.strictObject({
  ...pagination,
  q: text(120).optional(),
  growerId: id.optional(),
  crop: z.enum(cropKeys).optional(),
  kind: z.enum(siteKinds).optional(),
  archived: includeArchived,
  sort: z.enum(['name', 'crop', 'bloomStartOn', 'createdAt']).default('name'),
  order: sortOrder,
});

export type SiteCreateRequest = z.infer<typeof siteCreateRequest>;
export type SiteUpdateRequest = z.infer<typeof siteUpdateRequest>;

import { z } from 'zod';
import { calendarDate, latitude, longitude, version } from '../../../shared/schemas/common';

/** `GET /api/atlas?on=YYYY-MM-DD&reachKm=6` (the date defaults to today). */
export const atlasQuery = z.strictObject({
  on: calendarDate.optional(),
  // Spray reach: most foraging lies within about 6 km of the hive (Beekman & Ratnieks 2000).
  reachKm: z.coerce.number().min(0.5).max(20).default(6),
});

/** Largest boundary file accepted, in characters (the JSON body limit is 1 MB too). */
export const maxBoundaryFileChars = 900_000;

/** `POST /api/sites/:id/boundary`: a GeoJSON file's text, the version read, the drop layout. */
export const boundaryUploadRequest = z.strictObject({
  // KML is turned into GeoJSON in the browser (it needs a DOM parser); the server takes GeoJSON.
  format: z.literal('geojson', { message: 'Send the boundary as GeoJSON text.' }),
  text: z
    .string()
    .min(1, 'The file is empty.')
    .max(
      maxBoundaryFileChars,
      `The file is too large (at most ${maxBoundaryFileChars} characters).`,
    ),
  version,
  coloniesPerPallet: z.number().int().min(1).max(12).default(4),
  palletsPerDrop: z.number().int().min(1).max(100).default(4),
});

/** `PATCH /api/sites/:id/drops`: move one drop point (inside the boundary). */
export const dropMoveRequest = z.strictObject({
  version,
  drop: z.number().int().min(1),
  latitude,
  longitude,
});

export type BoundaryUploadRequest = z.infer<typeof boundaryUploadRequest>;
export type DropMoveRequest = z.infer<typeof dropMoveRequest>;

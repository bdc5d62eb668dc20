import { z } from 'zod';
import { kinks } from '@turf/turf';
import type { Polygon } from 'geojson';

/** Most vertices a boundary may have (a drawn or uploaded block rarely needs more than a few hundred). */
export const maxBoundaryVertices = 5_000;

const position = z.tuple([
  z
    .number()
    .min(-180, 'Longitude is between -180 and 180.')
    .max(180, 'Longitude is between -180 and 180.'),
  z.number().min(-90, 'Latitude is between -90 and 90.').max(90, 'Latitude is between -90 and 90.'),
]);

const ring = z
  .array(position)
  .min(4, 'A boundary ring needs at least 4 positions (the first repeated last).')
  .max(maxBoundaryVertices, `At most ${maxBoundaryVertices} vertices.`)
  .refine(
    (r) => r.length < 2 || (r[0][0] === r[r.length - 1][0] && r[0][1] === r[r.length - 1][1]),
    'The ring must end where it starts.',
  );

/** A GeoJSON Polygon (RFC 7946) whose rings close and whose edges do not cross. */
export const polygon = z
  .strictObject({
    type: z.literal('Polygon'),
    coordinates: z.array(ring).min(1, 'A polygon needs an outer ring.').max(50),
  })
  .refine((p) => kinks(p as Polygon).features.length === 0, {
    message: 'The boundary crosses itself; redraw it without crossing edges.',
  }) as unknown as z.ZodType<Polygon>;

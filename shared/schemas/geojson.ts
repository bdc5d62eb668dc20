import { z } from 'zod';
import type { Polygon } from 'geojson';
import { boundaryProblems } from '../domain/site-boundary';

/** Most vertices a boundary may have (a drawn or uploaded block rarely needs more than a few hundred). */
export const maxBoundaryVertices = 5_000;

// Shape and size limits first, so the crossing check never runs on a hostile, huge polygon.
const ring = z
  .array(z.array(z.number()).min(2).max(3))
  .max(maxBoundaryVertices, `At most ${maxBoundaryVertices} vertices.`);

/** A GeoJSON Polygon (RFC 7946) whose rings close and whose edges do not cross. */
export const polygon = z
  .strictObject({
    type: z.literal('Polygon'),
    coordinates: z
      .array(ring)
      .min(1, 'A polygon needs an outer ring.')
      .max(50, 'At most 50 rings.'),
  })
  .superRefine((value, ctx) => {
    for (const problem of boundaryProblems(value))
      ctx.addIssue({ code: 'custom', message: problem });
  }) as unknown as z.ZodType<Polygon>;

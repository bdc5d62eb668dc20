import { z } from 'zod';
import { CROP_KEYS, isCropKey, CROPS } from '../domain/crops';
import { polygon } from './geojson';
import { calendarDate, latitude, longitude } from './common';

/** A number, never a string that looks like one (no coercion). */
const number = () => z.number({ error: 'Must be a number.' });
/** A whole number ≥ min. */
const integer = (min: number) =>
  number().int('Must be a whole number.').min(min, `Must be at least ${min}.`);
/** A number > 0. */
const positive = () => number().gt(0, 'Must be greater than 0.');

/** A position { lat, lon } in WGS84 degrees. */
export const latLon = z.strictObject({ lat: latitude, lon: longitude });

/** POST /api/calc/hive-weight request (DESIGN.md, Calculation API). */
export const hiveWeightRequest = z.strictObject({
  boxes: z
    .array(
      z.strictObject({
        size: z.enum(['deep', 'medium', 'shallow'], { error: 'Must be deep, medium or shallow.' }),
        honeyFill: number()
          .min(0, 'Honey fill is between 0 and 1.')
          .max(1, 'Honey fill is between 0 and 1.'),
      }),
      { error: 'Must be a list of boxes.' },
    )
    .min(1, 'A hive needs at least one box.')
    .max(12, 'At most 12 boxes.'),
  includeBees: z.boolean({ error: 'Must be true or false.' }).optional(),
  includeFloorAndLid: z.boolean({ error: 'Must be true or false.' }).optional(),
});

/** Hive-weight statistics: sd > 0 needs at least 2 samples (t needs a degree of freedom). */
export const hiveWeightStats = z
  .strictObject({
    mean: positive(),
    sd: number().min(0, 'Must be 0 or more.'),
    samples: integer(1),
  })
  .refine((s) => s.sd === 0 || s.samples >= 2, {
    message: 'At least 2 weighed hives are needed when sd > 0.',
    path: ['samples'],
  });

/** POST /api/calc/load-plan request (DESIGN.md, Calculation API). */
export const loadPlanRequest = z.strictObject({
  colonies: integer(0).max(1_000_000, 'At most 1,000,000 colonies.'),
  coloniesPerPallet: integer(1).max(12, 'At most 12 colonies per pallet.'),
  palletTareKg: number().min(0, 'Must be 0 or more.'),
  hiveWeightKg: hiveWeightStats,
  trucks: z
    .array(
      z.strictObject({
        id: z
          .string({ error: 'Must be text.' })
          .min(1, 'Required.')
          .max(120, 'At most 120 characters.'),
        payloadKg: positive(),
        palletSpots: integer(1).max(1_000, 'At most 1,000 pallet spots.'),
        tiers: integer(1).max(4, 'At most 4 tiers.'),
      }),
      { error: 'Must be a list of trucks.' },
    )
    .min(1, 'At least one truck.')
    .max(500, 'At most 500 trucks.'),
});

/** POST /api/calc/move-window request (DESIGN.md, Calculation API). */
export const moveWindowRequest = z.strictObject({
  origin: latLon,
  destination: latLon,
  date: calendarDate,
  loadingMinutes: number().min(0, 'Must be 0 or more.').max(1_440, 'At most 1,440 minutes.'),
  averageSpeedKmh: positive().max(200, 'At most 200 km/h.'),
  roadFactor: number()
    .min(1, 'Road factor is at least 1.')
    .max(5, 'Road factor is at most 5.')
    .optional(),
  drivers: z.union([z.literal(1), z.literal(2)], { error: 'Must be 1 or 2.' }).optional(),
  loadingStart: z.iso
    .datetime({ offset: true, error: 'Must be an ISO 8601 time with an offset.' })
    .optional(),
  distanceKm: number().min(0, 'Must be 0 or more.').max(40_000, 'At most 40,000 km.').optional(),
});

/** A site boundary: a GeoJSON Polygon, size-capped, closed, without crossings. */
export const siteBoundary = polygon;

/** POST /api/calc/site-plan request (DESIGN.md, Calculation API). */
export const sitePlanRequest = z
  .strictObject({
    crop: z
      .string({ error: 'Must be a crop key.' })
      .min(1, 'Required.')
      .max(60, 'At most 60 characters.'),
    boundary: siteBoundary.optional(),
    areaHa: positive().max(1_000_000, 'At most 1,000,000 ha.').optional(),
    hivesPerAcre: positive().max(50, 'At most 50 colonies per acre.').optional(),
    coloniesPerPallet: integer(1).max(12, 'At most 12 colonies per pallet.'),
    palletsPerDrop: integer(1).max(1_000, 'At most 1,000 pallets per drop.'),
  })
  .superRefine((request, ctx) => {
    if (request.hivesPerAcre === undefined) {
      if (!isCropKey(request.crop)) {
        ctx.addIssue({
          code: 'custom',
          path: ['crop'],
          message: `Unknown crop; use one of ${CROP_KEYS.join(', ')}, or give hivesPerAcre.`,
        });
      } else if (CROPS[request.crop].hivesPerAcre === null) {
        ctx.addIssue({
          code: 'custom',
          path: ['hivesPerAcre'],
          message: `The crop ${request.crop} has no stocking rate; give hivesPerAcre.`,
        });
      }
    }
    if (request.boundary === undefined && request.areaHa === undefined) {
      ctx.addIssue({ code: 'custom', path: ['boundary'], message: 'Give a boundary or areaHa.' });
    }
  });

/** Parsed hive-weight request. */
export type HiveWeightRequest = z.infer<typeof hiveWeightRequest>;
/** Parsed load-plan request. */
export type LoadPlanRequest = z.infer<typeof loadPlanRequest>;
/** Parsed move-window request. */
export type MoveWindowRequest = z.infer<typeof moveWindowRequest>;
/** Parsed site-plan request. */
export type SitePlanRequest = z.infer<typeof sitePlanRequest>;

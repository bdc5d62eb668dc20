import { z } from 'zod';
import { calendarDate, id, pagination, text } from './common';
import { placeKinds } from './ledger';

/** Hive weights read off a scale at a yard (or while loading a move), in kilograms. */
export const weightSampleCreateRequest = z
  .strictObject({
    yardId: id.nullish(),
    lotId: id.nullish(),
    moveId: id.nullish(),
    sampledOn: calendarDate,
    weightsKg: z
      .array(
        z.number().positive('A hive weighs more than 0.').max(250, 'A hive weighs at most 250 kg.'),
      )
      .min(1, 'Enter at least one weight.')
      .max(500),
    notes: text(2000).optional(),
  })
  .refine((s) => s.yardId || s.moveId, {
    path: ['yardId'],
    message: 'Say where the hives were weighed (a yard or a move).',
  });

export const weightSampleListQuery = z.strictObject({
  ...pagination,
  yardId: id.optional(),
  lotId: id.optional(),
  moveId: id.optional(),
});

/** Frames-of-bees counts from colonies inspected at a place. */
export const strengthSampleCreateRequest = z.strictObject({
  placeKind: z.enum(placeKinds),
  placeId: id,
  lotId: id.nullish(),
  sampledOn: calendarDate,
  frames: z
    .array(z.number().min(0).max(40, 'At most 40 frames.'))
    .min(1, 'Enter at least one colony.')
    .max(1000),
  notes: text(2000).optional(),
});

export const strengthSampleListQuery = z.strictObject({
  ...pagination,
  placeKind: z.enum(placeKinds).optional(),
  placeId: id.optional(),
  lotId: id.optional(),
  minimumFrames: z.coerce.number().min(0).max(40).optional(),
});

export type WeightSampleCreateRequest = z.infer<typeof weightSampleCreateRequest>;
export type StrengthSampleCreateRequest = z.infer<typeof strengthSampleCreateRequest>;

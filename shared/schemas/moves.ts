import { z } from 'zod';
import { calendarDate, id, includeArchived, name, pagination, text, version } from './common';
import { placeKinds } from './ledger';

/** A move's life: drafted, planned, loading at the yards, rolling, placed, closed (or cancelled). */
export const moveStatuses = [
  'draft',
  'planned',
  'loading',
  'rolling',
  'placed',
  'closed',
  'cancelled',
] as const;
export type MoveStatus = (typeof moveStatuses)[number];

/** Which status may follow which. */
export const moveTransitions: Record<MoveStatus, MoveStatus[]> = {
  draft: ['planned', 'cancelled'],
  planned: ['draft', 'loading', 'cancelled'],
  loading: ['rolling', 'cancelled'],
  rolling: ['placed'],
  placed: ['closed'],
  closed: [],
  cancelled: [],
};

export const moveOrigin = z.strictObject({
  yardId: id,
  lotId: id,
  colonies: z.number().int().min(1, 'At least 1 colony.').max(100_000),
});

export const moveLoadInput = z.strictObject({
  truckId: id,
  driverNames: z.array(text(80)).max(2).optional(),
});

export const moveFields = z.strictObject({
  name,
  nightOf: calendarDate,
  destinationKind: z.enum(placeKinds),
  destinationIds: z.array(id).min(1, 'Choose a destination.').max(10),
  contractId: id.nullish(),
  drivers: z.union([z.literal(1), z.literal(2)]).optional(),
  loadingMinutes: z
    .number()
    .int()
    .min(0)
    .max(24 * 60)
    .optional(),
  averageSpeedKmh: z.number().positive('Speed must be more than 0.').max(130).optional(),
  origins: z.array(moveOrigin).min(1, 'Take colonies from at least one yard.').max(50),
  loads: z.array(moveLoadInput).max(100).optional(),
  notes: text(4000).optional(),
});
export const moveCreateRequest = moveFields;
export const moveUpdateRequest = moveFields.partial().extend({ version });
export const moveStatusRequest = z.strictObject({ version, status: z.enum(moveStatuses) });

export const moveListQuery = z.strictObject({
  ...pagination,
  status: z.enum(moveStatuses).optional(),
  from: calendarDate.optional(),
  to: calendarDate.optional(),
  archived: includeArchived,
});

export type MoveCreateRequest = z.infer<typeof moveCreateRequest>;
export type MoveUpdateRequest = z.infer<typeof moveUpdateRequest>;

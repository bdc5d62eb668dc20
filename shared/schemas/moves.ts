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

// ---- Planning: preview and availability -------------------------------------------------------

/**
 * A plan preview takes a move's create body (name optional) and, when editing a saved move, its
 * id so that move's own promises are not counted against it.
 */
export const movePreviewRequest = moveFields.extend({
  name: name.optional(),
  moveId: id.optional(),
});
export type MovePreviewRequest = z.infer<typeof movePreviewRequest>;

/** `GET /api/moves/availability?nightOf=YYYY-MM-DD[&exceptMoveId=…]`. */
export const moveAvailabilityQuery = z.strictObject({
  nightOf: calendarDate,
  exceptMoveId: id.optional(),
});

// ---- Crew recording ------------------------------------------------------------------------

/** The crew lead's check before a load rolls; each item is ticked or not. */
export const preRollCheck = z.strictObject({
  netsClipped: z.boolean(),
  strapsTight: z.boolean(),
  palletsClean: z.boolean(),
  waterAboard: z.boolean(),
  certificateInCab: z.boolean(),
  checkedAt: z.iso.datetime({ offset: true }).optional(),
});
export type PreRollCheck = z.infer<typeof preRollCheck>;

/** Colonies set down at one drop of one site (or at the destination yard). */
export const dropPlacement = z.strictObject({
  placeId: id,
  drop: text(40).optional(),
  colonies: z.number().int().min(0).max(100_000),
});

export type DropPlacement = z.infer<typeof dropPlacement>;

const palletCount = z.number().int('A whole number.').min(0).max(10_000);

/** Pallets loaded at one pick-up stop of a truck: a yard and the lot taken from it. */
export const stopPalletCount = z.strictObject({ yardId: id, lotId: id, pallets: palletCount });
export type StopPalletCount = z.infer<typeof stopPalletCount>;

const colonyCount = z.number().int('A whole number.').min(0).max(100_000);

/**
 * Colonies left in the yard at one pick-up stop of a truck (too weak, no room, a broken pallet):
 * they stay where they are, so the ledger keeps them in that yard.
 */
export const stopColonyCount = z.strictObject({ yardId: id, lotId: id, colonies: colonyCount });
export type StopColonyCount = z.infer<typeof stopColonyCount>;

/** What the crew records on one truck's load; every field optional, the load's version required. */
export const loadRecordFields = z.strictObject({
  palletsLoaded: palletCount.nullish(),
  /** Per pick-up stop; when given, palletsLoaded is their sum (or must equal it). */
  palletsByStop: z.array(stopPalletCount).max(100).nullish(),
  coloniesPlaced: colonyCount.nullish(),
  coloniesLeftBehind: colonyCount.nullish(),
  /** Per pick-up stop; when given, coloniesLeftBehind is their sum (or must equal it). */
  leftBehindByStop: z.array(stopColonyCount).max(100).nullish(),
  coloniesLost: colonyCount.nullish(),
  placements: z.array(dropPlacement).max(200).nullish(),
  preRollCheck: preRollCheck.nullish(),
  notes: text(4000).optional(),
});
export const loadRecordRequest = loadRecordFields.extend({ version });

/** What the crew has recorded on one load, as the API presents it (moves, load sheet, Tonight). */
export interface LoadRecord {
  palletsLoaded: number | null;
  palletsByStop: StopPalletCount[] | null;
  coloniesPlaced: number | null;
  coloniesLeftBehind: number | null;
  leftBehindByStop: StopColonyCount[] | null;
  coloniesLost: number | null;
  placements: DropPlacement[] | null;
  preRollCheck: PreRollCheck | null;
  notes: string;
  version: number;
}

/** A load with nothing recorded on it yet. */
export const nothingRecorded: LoadRecord = {
  palletsLoaded: null,
  palletsByStop: null,
  coloniesPlaced: null,
  coloniesLeftBehind: null,
  leftBehindByStop: null,
  coloniesLost: null,
  placements: null,
  preRollCheck: null,
  notes: '',
  version: 0,
};
export type LoadRecordRequest = z.infer<typeof loadRecordRequest>;

/** Hive weights read off a scale while loading a move. */
export const moveWeightsFields = z.strictObject({
  yardId: id.nullish(),
  lotId: id.nullish(),
  sampledOn: calendarDate.optional(),
  weightsKg: z
    .array(
      z.number().positive('A hive weighs more than 0.').max(250, 'A hive weighs at most 250 kg.'),
    )
    .min(1, 'Enter at least one weight.')
    .max(500),
  notes: text(2000).optional(),
});

/** A note the crew adds to a load (or to the move when no load is named). */
export const moveNoteFields = z.strictObject({ text: text(2000).trim().min(1, 'Required.') });

// ---- Offline sync --------------------------------------------------------------------------

export const syncKinds = ['load-counts', 'status', 'weights', 'note'] as const;
export type SyncKind = (typeof syncKinds)[number];

/** An idempotency key: the client makes one per change (a UUID is a good choice). */
export const idempotencyKey = z
  .string()
  .min(8, 'At least 8 characters.')
  .max(100)
  .regex(/^[A-Za-z0-9_.:-]+$/, 'Letters, digits, and _ . : - only.');

/** The envelope of one queued change; its payload is checked by kind (moveSyncPayloads). */
export const moveSyncChange = z.strictObject({
  idempotencyKey,
  kind: z.enum(syncKinds),
  moveId: id,
  loadId: id.optional(),
  version: version.optional(),
  payload: z.unknown(),
});
export type MoveSyncChange = z.infer<typeof moveSyncChange>;

/** Payload schema of each kind of change. */
export const moveSyncPayloads = {
  'load-counts': loadRecordFields,
  status: z.strictObject({ status: z.enum(moveStatuses) }),
  weights: moveWeightsFields,
  note: moveNoteFields,
} as const;

/** A batch of changes queued on a device while it had no signal. */
export const moveSyncRequest = z.strictObject({
  changes: z.array(z.unknown()).min(1, 'Send at least one change.').max(200),
});

/** What became of one change. */
export const syncOutcomes = ['applied', 'duplicate', 'conflict', 'rejected', 'failed'] as const;
export type SyncOutcome = (typeof syncOutcomes)[number];

// ---- Season board ----------------------------------------------------------------------------

/** `GET /api/season?from=YYYY-MM-DD&to=YYYY-MM-DD` (at most 60 weeks). */
export const seasonBoardQuery = z
  .strictObject({ from: calendarDate, to: calendarDate })
  .refine((q) => q.from <= q.to, {
    path: ['to'],
    message: 'The period ends on or after it starts.',
  })
  .refine((q) => Date.parse(q.to) - Date.parse(q.from) <= 420 * 86_400_000, {
    path: ['to'],
    message: 'At most 60 weeks at a time.',
  });

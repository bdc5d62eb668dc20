import { z } from 'zod';
import { cropKeys } from './sites';
import { calendarDate, id, includeArchived, pagination, sortOrder, text, version } from './common';

/**
 * A contract's life: drafted, offered to the grower, agreed (or turned down), colonies in the
 * bloom, released after bloom, settled when paid up; withdrawn at any point before settling.
 */
export const contractStatuses = [
  'draft',
  'offered',
  'agreed',
  'turned-down',
  'in-bloom',
  'released',
  'settled',
  'withdrawn',
] as const;
export type ContractStatus = (typeof contractStatuses)[number];

const money = z.number().int('Whole cents.').min(0).max(100_000_000);

export const contractFields = z.strictObject({
  growerId: id,
  siteIds: z.array(id).max(50).optional(),
  crop: z.enum(cropKeys),
  season: z.number().int().min(2000).max(2100),
  status: z.enum(contractStatuses).optional(),
  coloniesOrdered: z.number().int().min(1, 'At least 1 colony.').max(200_000),
  minFrames: z.number().min(0).max(30),
  averageFrames: z.number().min(0).max(30).nullish(),
  feePerColonyCents: money,
  depositCents: money.optional(),
  frameAdjustmentCents: z.number().int().min(-100_000).max(100_000).optional(),
  deliveryStartOn: calendarDate,
  deliveryEndOn: calendarDate,
  removalOn: calendarDate.nullish(),
  sprayNoticeHours: z
    .number()
    .int()
    .min(0)
    .max(24 * 14)
    .optional(),
  terms: text(8000).optional(),
  internalNotes: text(4000).optional(),
});

const windowInOrder = (c: { deliveryStartOn?: string; deliveryEndOn?: string }) =>
  !c.deliveryStartOn || !c.deliveryEndOn || c.deliveryStartOn <= c.deliveryEndOn;
const removalAfterDelivery = (c: { deliveryStartOn?: string; removalOn?: string | null }) =>
  !c.removalOn || !c.deliveryStartOn || c.removalOn >= c.deliveryStartOn;

export const contractCreateRequest = contractFields
  .refine(windowInOrder, {
    path: ['deliveryEndOn'],
    message: 'The delivery window ends on or after it starts.',
  })
  .refine(removalAfterDelivery, { path: ['removalOn'], message: 'Removal comes after delivery.' });
export const contractUpdateRequest = contractFields
  .partial()
  .extend({ version })
  .refine(windowInOrder, {
    path: ['deliveryEndOn'],
    message: 'The delivery window ends on or after it starts.',
  })
  .refine(removalAfterDelivery, { path: ['removalOn'], message: 'Removal comes after delivery.' });

export const contractListQuery = z.strictObject({
  ...pagination,
  status: z.enum(contractStatuses).optional(),
  crop: z.enum(cropKeys).optional(),
  season: z.coerce.number().int().min(2000).max(2100).optional(),
  growerId: id.optional(),
  archived: includeArchived,
  sort: z
    .enum(['deliveryStartOn', 'season', 'coloniesOrdered', 'createdAt'])
    .default('deliveryStartOn'),
  order: sortOrder,
});

export type ContractCreateRequest = z.infer<typeof contractCreateRequest>;
export type ContractUpdateRequest = z.infer<typeof contractUpdateRequest>;

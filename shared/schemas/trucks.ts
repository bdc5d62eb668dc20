import { z } from 'zod';
import { includeArchived, name, pagination, text, version } from './common';

/** 80,000 lb, the US Interstate gross limit (23 CFR 658.17), in kilograms. */
export const interstateGrossLimitKg = 80_000 * 0.45359237;

export const truckFields = z.strictObject({
  name,
  payloadKg: z.number().positive('Payload must be more than 0.').max(60_000),
  palletSpots: z.number().int().min(1, 'At least one pallet spot.').max(200),
  tiers: z.number().int().min(1, 'At least one tier.').max(4),
  tareKg: z.number().min(0).max(60_000),
  legalGrossKg: z.number().positive().max(100_000).optional(),
  notes: text(2000).optional(),
});
export const truckCreateRequest = truckFields.extend({
  legalGrossKg: z.number().positive().max(100_000).default(interstateGrossLimitKg),
});
export const truckUpdateRequest = truckFields.partial().extend({ version });
export const truckListQuery = z.strictObject({ ...pagination, archived: includeArchived });

export type TruckCreateRequest = z.infer<typeof truckCreateRequest>;

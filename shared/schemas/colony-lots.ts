import { z } from 'zod';
import { id, includeArchived, name, pagination, text, version } from './common';

export const queenStatuses = ['queen-right', 'queenless', 'requeened', 'unknown'] as const;

export const colonyLotFields = z.strictObject({
  name,
  hiveSetupId: id,
  coloniesPerPallet: z.number().int().min(1).max(12),
  queenStatus: z.enum(queenStatuses).optional(),
  meanFrames: z.number().min(0).max(30).nullish(),
  notes: text(2000).optional(),
});
export const colonyLotCreateRequest = colonyLotFields;
export const colonyLotUpdateRequest = colonyLotFields.partial().extend({ version });
export const colonyLotListQuery = z.strictObject({ ...pagination, archived: includeArchived });

export type ColonyLotCreateRequest = z.infer<typeof colonyLotCreateRequest>;

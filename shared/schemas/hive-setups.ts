import { BOX_SIZES, type BoxSize } from '../domain/hive-weight';
import { z } from 'zod';
import { includeArchived, name, pagination, version } from './common';

export const boxSizes = BOX_SIZES as readonly BoxSize[] as ['deep', 'medium', 'shallow'];
export type { BoxSize };

/** One box of a hive stack and how full of honey it is (0–1). */
export const hiveBox = z.strictObject({
  size: z.enum(boxSizes),
  honeyFill: z
    .number()
    .min(0, 'Honey fill is between 0 and 1.')
    .max(1, 'Honey fill is between 0 and 1.'),
});
export type HiveBox = z.infer<typeof hiveBox>;

export const hiveSetupFields = z.strictObject({
  name,
  boxes: z.array(hiveBox).min(1, 'A hive has at least one box.').max(8, 'At most 8 boxes.'),
});
export const hiveSetupCreateRequest = hiveSetupFields;
export const hiveSetupUpdateRequest = hiveSetupFields.partial().extend({ version });
export const hiveSetupListQuery = z.strictObject({ ...pagination, archived: includeArchived });

export type HiveSetupCreateRequest = z.infer<typeof hiveSetupCreateRequest>;

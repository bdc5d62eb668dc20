import { z } from 'zod';
import {
  calendarDate,
  includeArchived,
  latitude,
  longitude,
  name,
  pagination,
  sortOrder,
  text,
  version,
} from './common';

/** What a planner enters for a yard; optional fields default on the server. */
export const yardFields = z.strictObject({
  name,
  latitude,
  longitude,
  capacity: z.number().int('A whole number of colonies.').min(0).max(100_000),
  accessNotes: text(2000).optional(),
  notes: text(4000).optional(),
  lastVisitOn: calendarDate.nullable().optional(),
});
export const yardCreateRequest = yardFields;
export const yardUpdateRequest = yardFields.partial().extend({ version });

export const yardSortFields = ['name', 'capacity', 'lastVisitOn', 'createdAt'] as const;
export const yardListQuery = z.strictObject({
  ...pagination,
  q: text(120).optional(),
  archived: includeArchived,
  sort: z.enum(yardSortFields).default('name'),
  order: sortOrder,
});

export type YardCreateRequest = z.infer<typeof yardCreateRequest>;
export type YardUpdateRequest = z.infer<typeof yardUpdateRequest>;
export type YardListQuery = z.infer<typeof yardListQuery>;

/** A yard as the API presents it, with its colonies today from the ledger. */
export interface YardView {
  id: string;
  name: string;
  latitude: number;
  longitude: number;
  capacity: number;
  accessNotes: string;
  notes: string;
  lastVisitOn: string | null;
  version: number;
  archivedAt: string | null;
  colonies: number;
  coloniesBySetup: Array<{ hiveSetupId: string; hiveSetupName: string; colonies: number }>;
}

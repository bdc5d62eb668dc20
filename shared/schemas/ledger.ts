import { z } from 'zod';
import { calendarDate, id, pagination, text } from './common';

export const placeKinds = ['yard', 'site'] as const;
export type PlaceKind = (typeof placeKinds)[number];
export const ledgerKinds = ['move', 'loss', 'split', 'purchase', 'correction'] as const;
export type LedgerKind = (typeof ledgerKinds)[number];

export const place = z.strictObject({ kind: z.enum(placeKinds), id });
export type Place = z.infer<typeof place>;

/**
 * A ledger entry as a user records it. A move takes colonies from one place to another; a loss
 * takes them away; a split or purchase adds them; a correction does either (exactly one side).
 */
export const ledgerEntryCreateRequest = z
  .strictObject({
    lotId: id,
    kind: z.enum(ledgerKinds),
    occurredOn: calendarDate,
    colonies: z
      .number()
      .int('A whole number of colonies.')
      .min(1, 'At least 1 colony.')
      .max(100_000),
    from: place.nullish(),
    to: place.nullish(),
    reason: text(1000).trim().min(1, 'Say why.'),
  })
  .superRefine((entry, ctx) => {
    const need = {
      move: [true, true],
      loss: [true, false],
      split: [false, true],
      purchase: [false, true],
      correction: [null, null],
    }[entry.kind];
    const hasFrom = Boolean(entry.from);
    const hasTo = Boolean(entry.to);
    if (entry.kind === 'correction') {
      if (hasFrom === hasTo) {
        ctx.addIssue({
          code: 'custom',
          path: ['from'],
          message: 'A correction either removes (from) or adds (to) colonies.',
        });
      }
      return;
    }
    if (need[0] !== hasFrom) {
      ctx.addIssue({
        code: 'custom',
        path: ['from'],
        message: need[0]
          ? `A ${entry.kind} needs the place the colonies leave.`
          : `A ${entry.kind} has no "from" place.`,
      });
    }
    if (need[1] !== hasTo) {
      ctx.addIssue({
        code: 'custom',
        path: ['to'],
        message: need[1]
          ? `A ${entry.kind} needs the place the colonies go to.`
          : `A ${entry.kind} has no "to" place.`,
      });
    }
    if (entry.kind === 'move' && entry.from && entry.to && entry.from.id === entry.to.id) {
      ctx.addIssue({ code: 'custom', path: ['to'], message: 'A move goes to a different place.' });
    }
  });

export const ledgerListQuery = z.strictObject({
  ...pagination,
  lotId: id.optional(),
  placeKind: z.enum(placeKinds).optional(),
  placeId: id.optional(),
  kind: z.enum(ledgerKinds).optional(),
  from: calendarDate.optional(),
  to: calendarDate.optional(),
});

export const ledgerCountsQuery = z.strictObject({
  on: calendarDate.optional(),
  placeKind: z.enum(placeKinds).optional(),
  placeId: id.optional(),
});

export type LedgerEntryCreateRequest = z.infer<typeof ledgerEntryCreateRequest>;

/** Colonies of one lot at one place on a date. */
export interface ColonyCount {
  placeKind: PlaceKind;
  placeId: string;
  placeName: string;
  lotId: string;
  lotName: string;
  hiveSetupId: string;
  hiveSetupName: string;
  colonies: number;
}

import { z } from 'zod';
import { calendarDate, id, text, version } from './common';

/** What a grower can do with a proposed delivery window. */
export const proposalPurposes = ['confirm', 'decline', 'counter'] as const;
export type ProposalPurpose = (typeof proposalPurposes)[number];

/**
 * A proposal is open until the grower answers it (confirmed, declined, or countered with another
 * window) or the planner sends a newer one (superseded).
 */
export const proposalStatuses = [
  'open',
  'confirmed',
  'declined',
  'countered',
  'superseded',
] as const;
export type ProposalStatus = (typeof proposalStatuses)[number];

const windowInOrder = (w: { deliveryStartOn: string; deliveryEndOn: string }) =>
  w.deliveryStartOn <= w.deliveryEndOn;
const windowMessage = {
  path: ['deliveryEndOn'],
  message: 'The delivery window ends on or after it starts.',
};

/** POST /api/contracts/:id/proposals: the window and colonies put to the grower. */
export const proposalCreateRequest = z
  .strictObject({
    deliveryStartOn: calendarDate,
    deliveryEndOn: calendarDate,
    colonies: z.number().int().min(1, 'At least 1 colony.').max(200_000),
    note: text(2000).optional(),
    /** The contract version the planner saw; 409 when it changed since. */
    version: version.optional(),
  })
  .refine(windowInOrder, windowMessage);

/** POST /api/proposals/:id/counter (and the counter form of an e-mail link). */
export const proposalCounterRequest = z
  .strictObject({
    deliveryStartOn: calendarDate,
    deliveryEndOn: calendarDate,
    colonies: z.number().int().min(1, 'At least 1 colony.').max(200_000).optional(),
    note: text(2000).optional(),
  })
  .refine(windowInOrder, windowMessage);

/** POST /api/proposals/:id/confirm and /decline. */
export const proposalAnswerRequest = z.strictObject({ note: text(2000).optional() });

/** GET /api/proposals. */
export const proposalListQuery = z.strictObject({
  contractId: id.optional(),
  status: z.enum(proposalStatuses).optional(),
});

/** The counter form posted from an e-mail link (form fields are strings; colonies optional). */
export const counterForm = z
  .object({
    deliveryStartOn: calendarDate,
    deliveryEndOn: calendarDate,
    colonies: z
      .string()
      .trim()
      .max(7)
      .transform((v) => (v === '' ? undefined : Number(v)))
      .pipe(z.number().int('Whole colonies.').min(1).max(200_000).optional())
      .optional(),
    note: text(2000).optional(),
  })
  .refine(windowInOrder, windowMessage);

export type ProposalCreateRequest = z.infer<typeof proposalCreateRequest>;
export type ProposalCounterRequest = z.infer<typeof proposalCounterRequest>;

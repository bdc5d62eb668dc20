import { z } from 'zod';
import { id, includeArchived, pagination, text, version } from './common';

/** What the beekeeper does about a planned spray: move the colonies, cover them, or nothing. */
export const sprayActions = ['move', 'cover', 'no-action'] as const;
export type SprayAction = (typeof sprayActions)[number];
export const sprayNoticeStatuses = ['filed', 'acknowledged'] as const;

/** Shown with every spray notice, in the app and in e-mails. */
export const sprayCaution =
  'Pesticides can harm bees and people. Apply only as the product label directs, including its bee-hazard and re-entry statements, and follow your state and local rules on notice to beekeepers. This notice helps plan around a spray; it does not replace the label, those rules, or licensed advice.';

/** An instant written with its offset (or Z), e.g. 2027-02-20T05:30:00-08:00. */
const instant = z.iso.datetime({
  offset: true,
  message: 'Use an ISO 8601 date and time with its offset, e.g. 2027-02-20T05:30:00-08:00.',
});

const maxWindowMs = 14 * 24 * 3600 * 1000;

export const sprayNoticeCreateRequest = z
  .strictObject({
    siteId: id,
    startsAt: instant,
    endsAt: instant,
    product: text(200).trim().min(1, 'Name the product.'),
    notes: text(4000).optional(),
  })
  .refine((n) => Date.parse(n.endsAt) > Date.parse(n.startsAt), {
    path: ['endsAt'],
    message: 'The spray ends after it starts.',
  })
  .refine((n) => Date.parse(n.endsAt) - Date.parse(n.startsAt) <= maxWindowMs, {
    path: ['endsAt'],
    message: 'One notice covers at most 14 days.',
  });

export const sprayNoticeAcknowledgeRequest = z.strictObject({
  version,
  action: z.enum(sprayActions),
  note: text(2000).optional(),
});

export const sprayNoticeListQuery = z.strictObject({
  ...pagination,
  siteId: id.optional(),
  status: z.enum(sprayNoticeStatuses).optional(),
  /** Notices whose window ends after this instant. */
  from: instant.optional(),
  /** Notices whose window starts before this instant. */
  to: instant.optional(),
  archived: includeArchived,
});

export type SprayNoticeCreateRequest = z.infer<typeof sprayNoticeCreateRequest>;
export type SprayNoticeAcknowledgeRequest = z.infer<typeof sprayNoticeAcknowledgeRequest>;

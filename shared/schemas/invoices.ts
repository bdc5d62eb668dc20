import { z } from 'zod';
import { calendarDate, id, pagination, text, version } from './common';

/**
 * An invoice's life: a `draft` the owner can still void, `sent` to the grower (numbered, dated,
 * due), `paid` once payments cover it, or `void` (cancelled; kept with its number).
 */
export const invoiceStatuses = ['draft', 'sent', 'paid', 'void'] as const;
export type InvoiceStatus = (typeof invoiceStatuses)[number];

/** What an invoice bills: the deposit on agreement, the balance after placement, or a one-off. */
export const invoiceKinds = ['deposit', 'balance', 'adjustment'] as const;
export type InvoiceKind = (typeof invoiceKinds)[number];

/** One printed line of an invoice. */
export interface InvoiceLineItem {
  kind: 'deposit' | 'fee' | 'strength-adjustment' | 'below-minimum' | 'deposit-paid';
  description: string;
  /** Cents; negative for a reduction or a credit. */
  amountCents: number;
}

/** The figures behind an invoice's lines, kept with it so it can be re-read later. */
export interface InvoiceBasis {
  /** Colonies placed at the contract's sites (the most there at once in the contract's span). */
  coloniesPlaced?: number;
  feePerColonyCents?: number;
  /** Strength inspection pooled over the contract's sites, when the contract adjusts by frames. */
  strength?: {
    coloniesSampled: number;
    measuredAverageFrames: number;
    targetAverageFrames: number;
    perFramePerColonyCents: number;
    reductionsOnly: boolean;
  } | null;
  /** Why no strength line was added, when the contract has frame terms. */
  strengthNote?: string;
  depositPaidCents?: number;
}

/** `POST /api/invoices`: the lines are computed from the contract, never sent by the client. */
export const invoiceCreateRequest = z.strictObject({
  contractId: id,
  kind: z.enum(['deposit', 'balance']),
  internalNotes: text(2000).optional(),
});
export type InvoiceCreateRequest = z.infer<typeof invoiceCreateRequest>;

/** `POST /api/invoices/:id/issue`: due net 30 days unless a due date is given. */
export const invoiceIssueRequest = z.strictObject({
  version,
  dueOn: calendarDate.optional(),
});
export type InvoiceIssueRequest = z.infer<typeof invoiceIssueRequest>;

/** `POST /api/invoices/:id/void`. */
export const invoiceVoidRequest = z.strictObject({ version });

/** `POST /api/invoices/:id/checkout` takes nothing: the amount is what is still owed. */
export const checkoutRequest = z.strictObject({});

export const invoiceListQuery = z.strictObject({
  ...pagination,
  status: z.enum(invoiceStatuses).optional(),
  growerId: id.optional(),
  contractId: id.optional(),
});
export type InvoiceListQuery = z.infer<typeof invoiceListQuery>;

/** `GET /api/receivables`: ages on `asOf` (today by default); revenue of `season`. */
export const receivablesQuery = z.strictObject({
  asOf: calendarDate.optional(),
  season: z.coerce.number().int().min(2000).max(2100).optional(),
});

/** Days-past-due buckets of the receivables view, in order. */
export const ageBuckets = ['current', '1-30', '31-60', '61-90', '90+'] as const;
export type AgeBucket = (typeof ageBuckets)[number];

import type {
  InvoiceBasis,
  InvoiceKind,
  InvoiceLineItem,
  InvoiceStatus,
} from '@shared/schemas/invoices';
import type { CropKey } from '@shared/schemas/sites';

/** An invoice as `GET /api/invoices` presents it; growers never get `internalNotes`. */
export interface Invoice {
  id: string;
  number: number;
  kind: InvoiceKind;
  status: InvoiceStatus;
  contractId: string;
  growerId: string;
  growerName: string;
  crop: CropKey;
  season: number;
  lines: InvoiceLineItem[];
  amountCents: number;
  paidCents: number;
  outstandingCents: number;
  issuedOn: string | null;
  dueOn: string | null;
  paidAt: string | null;
  voidedAt: string | null;
  basis: InvoiceBasis;
  internalNotes?: string;
  version: number;
  createdAt: string | null;
}

/** Money received against an invoice; the provider's reference is withheld from growers. */
export interface InvoicePayment {
  id: string;
  amountCents: number;
  receivedAt: string;
  providerReference?: string;
}

/** `GET /api/invoices/:id`: the invoice with what a printed copy needs. */
export interface InvoiceDetail extends Invoice {
  operationName: string;
  billingAddress: string;
  payments: InvoicePayment[];
}

export interface InvoiceFilters {
  status?: InvoiceStatus;
  growerId?: string;
}

/** `POST /api/invoices/:id/checkout`: where to send the payer. */
export interface CheckoutStarted {
  checkoutUrl: string;
  sessionId: string;
  amountCents: number;
  expiresAt: string | null;
}

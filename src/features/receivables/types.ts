import type { AgeBucket } from '@shared/schemas/invoices';

/** `GET /api/receivables`: what is owed on sent invoices, by grower and age; revenue by crop. */
export interface Receivables {
  asOf: string;
  season: number;
  buckets: readonly AgeBucket[];
  byGrower: Array<{
    growerId: string;
    growerName: string;
    owedCents: number;
    buckets: Record<AgeBucket, number>;
  }>;
  totals: { owedCents: number; buckets: Record<AgeBucket, number> };
  revenueByCrop: Array<{
    crop: string;
    invoices: number;
    invoicedCents: number;
    receivedCents: number;
  }>;
}

export interface ReceivablesQuery {
  asOf?: string;
  season?: number;
}

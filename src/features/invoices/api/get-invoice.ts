import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { api } from '@/lib/api-client';
import type { InvoiceDetail } from '../types';
import { invoiceKeys } from './keys';

export const getInvoice = (id: string) =>
  api.get<InvoiceDetail>(`/api/invoices/${encodeURIComponent(id)}`);

export const getInvoiceQueryOptions = (id: string) =>
  queryOptions({ queryKey: invoiceKeys.detail(id), queryFn: () => getInvoice(id) });

/** How often, and how many times, to look again after the provider sends the payer back. */
export const PAID_POLL_MS = 1500;
export const PAID_POLL_TRIES = 8;

/**
 * One invoice. With `awaitPayment`, it is read again a few times until the webhook has marked
 * it paid, since the payer can come back before the provider's event arrives. `checking` is
 * true while those reads go on.
 */
export function useInvoice(id: string, awaitPayment = false) {
  const query = useSuspenseQuery({
    ...getInvoiceQueryOptions(id),
    refetchInterval: (q) =>
      awaitPayment && q.state.data?.status === 'sent' && q.state.dataUpdateCount <= PAID_POLL_TRIES
        ? PAID_POLL_MS
        : false,
  });
  // The reads stop after PAID_POLL_TRIES; the last one lands about this long after arrival.
  const [arrivedAt] = useState(() => Date.now());
  const checking =
    awaitPayment && query.dataUpdatedAt - arrivedAt < PAID_POLL_MS * (PAID_POLL_TRIES - 1);
  return { invoice: query.data, checking };
}

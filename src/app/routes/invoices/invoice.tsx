import type { QueryClient } from '@tanstack/react-query';
import { useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { getInvoiceQueryOptions, useInvoice } from '@/features/invoices/api/get-invoice';
import { InvoiceDetailView } from '@/features/invoices/components/invoice-detail';
import { paymentOutcomeFrom } from '@/features/invoices/components/payment-result';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner', 'grower']);
    await queryClient.ensureQueryData(getInvoiceQueryOptions(params.invoiceId!));
    return null;
  };

/**
 * /invoices/:invoiceId: the invoice; also where the payment provider sends the payer back
 * (`?payment=complete` or `?payment=cancelled`).
 */
export function InvoiceRoute() {
  const id = useParams().invoiceId!;
  const [params] = useSearchParams();
  const outcome = paymentOutcomeFrom(params.get('payment'));
  const { invoice, checking } = useInvoice(id, outcome === 'complete');
  return (
    <InvoiceDetailView invoice={invoice} payment={outcome ? { outcome, checking } : undefined} />
  );
}

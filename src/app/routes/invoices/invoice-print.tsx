import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { Button } from '@/components/ui/button';
import { getInvoiceQueryOptions } from '@/features/invoices/api/get-invoice';
import { PrintableInvoice } from '@/features/invoices/components/printable-invoice';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner', 'grower']);
    await queryClient.ensureQueryData(getInvoiceQueryOptions(params.invoiceId!));
    return null;
  };

/** /invoices/:invoiceId/print: the invoice on one clean page. */
export function InvoicePrintRoute() {
  const id = useParams().invoiceId!;
  const { data: invoice } = useSuspenseQuery(getInvoiceQueryOptions(id));
  return (
    <>
      <div className="invoice-screen-only mb-6 flex flex-wrap items-center justify-between gap-3">
        <Link to={paths.invoice(id)}>← Back to the invoice</Link>
        <Button onClick={() => window.print()}>Print</Button>
      </div>
      <PrintableInvoice invoice={invoice} />
    </>
  );
}

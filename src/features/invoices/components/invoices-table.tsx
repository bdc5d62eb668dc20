import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { SimpleTable } from '@/components/ui/table';
import { cropName } from '@/lib/crops';
import { formatDate, formatDollars } from '@/lib/units';
import type { Invoice } from '../types';
import { InvoiceStatusBadge, invoiceKindLabel } from './invoice-status';

/**
 * Invoices in the order the API gives them (newest number first); the number opens the invoice.
 * A plain table: the filters run on the server. (The sortable DataTable kept client navigation
 * away from this page from ever committing in tests; see the report of this change.)
 */
export function InvoicesTable({ invoices }: { invoices: Invoice[] }) {
  if (invoices.length === 0)
    return <p className="text-dusk-300">No invoices match these filters.</p>;
  return (
    <SimpleTable
      caption="Invoices"
      headers={['Number', 'Grower', 'For', 'State', 'Amount', 'Owed', 'Due']}
      rows={invoices.map((i) => [
        <Link key="n" to={paths.invoice(i.id)}>
          {i.number}
        </Link>,
        i.growerName,
        `${cropName(i.crop)} ${i.season}, ${invoiceKindLabel(i.kind).toLowerCase()}`,
        <InvoiceStatusBadge key="s" status={i.status} />,
        <span key="a" className="tabular-nums">
          {formatDollars(i.amountCents)}
        </span>,
        <span key="o" className="tabular-nums">
          {formatDollars(i.outstandingCents)}
        </span>,
        formatDate(i.dueOn),
      ])}
    />
  );
}

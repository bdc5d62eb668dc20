import { Link } from 'react-router-dom';
import { Badge } from '@/components/ui/badge';
import { EmptyState } from '@/components/ui/empty-state';
import { formatDate, formatDollars } from '@/lib/units';
import type { PortalInvoice } from '../types';

const statusTone = { paid: 'green', sent: 'amber', void: 'neutral', draft: 'neutral' } as const;
const statusLabel: Record<string, string> = {
  paid: 'Paid',
  sent: 'Due',
  void: 'Void',
  draft: 'Draft',
};

/** The grower's invoices: number, amount, status, each linking to its page. */
export function PortalInvoices({
  invoices,
  invoiceHref,
}: {
  invoices: PortalInvoice[];
  invoiceHref: (id: string) => string;
}) {
  if (invoices.length === 0)
    return (
      <EmptyState title="No invoices yet">Invoices for your contracts appear here.</EmptyState>
    );
  return (
    <ul className="flex flex-col divide-y divide-dusk-700" aria-label="Invoices">
      {invoices.map((invoice) => (
        <li key={invoice.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
          <span>
            <Link to={invoiceHref(invoice.id)} className="font-medium">
              {invoice.number ? `Invoice ${invoice.number}` : 'Invoice'}
            </Link>
            <span className="block text-sm text-dusk-300">
              {invoice.dueOn ? `Due ${formatDate(invoice.dueOn)}` : formatDate(invoice.issuedOn)}
            </span>
          </span>
          <span className="flex items-center gap-3">
            <span className="font-medium">{formatDollars(invoice.amountCents)}</span>
            <Badge tone={statusTone[invoice.status as keyof typeof statusTone] ?? 'neutral'}>
              {statusLabel[invoice.status] ?? invoice.status}
            </Badge>
          </span>
        </li>
      ))}
    </ul>
  );
}

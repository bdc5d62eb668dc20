import type { InvoiceKind, InvoiceStatus } from '@shared/schemas/invoices';
import { Badge } from '@/components/ui/badge';

const statusLabel: Record<InvoiceStatus, string> = {
  draft: 'Draft',
  sent: 'Awaiting payment',
  paid: 'Paid',
  void: 'Void',
};
const statusTone = { draft: 'neutral', sent: 'amber', paid: 'green', void: 'red' } as const;

/** An invoice's state as a badge. */
export function InvoiceStatusBadge({ status }: { status: InvoiceStatus }) {
  return <Badge tone={statusTone[status]}>{statusLabel[status]}</Badge>;
}

export const invoiceStatusLabel = (status: InvoiceStatus) => statusLabel[status];

const kindLabel: Record<InvoiceKind, string> = {
  deposit: 'Deposit',
  balance: 'Balance',
  adjustment: 'Adjustment',
};

/** "Deposit", "Balance" or "Adjustment". */
export const invoiceKindLabel = (kind: InvoiceKind) => kindLabel[kind];

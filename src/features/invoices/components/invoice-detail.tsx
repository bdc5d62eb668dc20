import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { ButtonLink } from '@/components/ui/button';
import { Facts, PageHeader, Section } from '@/components/ui/page-header';
import { SimpleTable } from '@/components/ui/table';
import { useUser } from '@/lib/auth';
import { cropName } from '@/lib/crops';
import { formatDate, formatDateTime, formatDollars } from '@/lib/units';
import type { InvoiceDetail } from '../types';
import { InvoiceBasisNote } from './invoice-basis';
import { InvoiceLines } from './invoice-lines';
import { InvoiceOwnerActions } from './invoice-actions';
import { InvoiceStatusBadge, invoiceKindLabel } from './invoice-status';
import { PayOnline } from './pay-online';
import { PaymentResult, type PaymentOutcome } from './payment-result';

/** "Invoice 12: Almond pollination deposit, 2027". */
export const invoiceTitle = (invoice: Pick<InvoiceDetail, 'number' | 'crop' | 'kind' | 'season'>) =>
  `Invoice ${invoice.number}: ${cropName(invoice.crop)} pollination ${invoiceKindLabel(invoice.kind).toLowerCase()}, ${invoice.season}`;

/**
 * One invoice: its state, lines and how they were worked out, payments received. The owner
 * issues or voids it, a planner only reads, the grower pays online.
 */
export function InvoiceDetailView({
  invoice,
  payment,
}: {
  invoice: InvoiceDetail;
  /** Set when the payer has just come back from the provider's page. */
  payment?: { outcome: PaymentOutcome; checking: boolean };
}) {
  const user = useUser();
  const owner = user.role === 'owner';
  const grower = user.role === 'grower';
  const payable = invoice.status === 'sent' && invoice.outstandingCents > 0;

  return (
    <>
      <PageHeader
        title={invoiceTitle(invoice)}
        description={
          <span className="inline-flex flex-wrap items-center gap-2">
            <span data-testid="invoice-status">
              <InvoiceStatusBadge status={invoice.status} />
            </span>
            <span>
              {invoice.growerName} · {formatDollars(invoice.amountCents)}
            </span>
          </span>
        }
        back={<Link to={paths.invoices}>← {grower ? 'Your invoices' : 'All invoices'}</Link>}
        actions={
          <>
            {owner && <InvoiceOwnerActions invoice={invoice} />}
            {invoice.status !== 'draft' || !grower ? (
              <ButtonLink variant="secondary" to={paths.invoicePrint(invoice.id)}>
                Printable copy
              </ButtonLink>
            ) : null}
          </>
        }
      />
      <div className="flex flex-col gap-6">
        {payment && (
          <PaymentResult
            outcome={payment.outcome}
            status={invoice.status}
            checking={payment.checking}
          />
        )}
        {grower && payable && (
          <Section title="Pay this invoice">
            <PayOnline invoice={invoice} />
          </Section>
        )}
        {!grower && invoice.status === 'draft' && (
          <p className="text-dusk-300">
            A draft: {invoice.growerName} does not see it until it is issued.
            {!owner && ' Only the owner can issue or void invoices.'}
          </p>
        )}
        <div className="grid gap-6 lg:grid-cols-3 lg:items-start">
          <div className="flex flex-col gap-6 lg:col-span-2">
            <Section title="Lines">
              <InvoiceLines invoice={invoice} />
            </Section>
            <Section title="How it was worked out">
              <InvoiceBasisNote invoice={invoice} />
            </Section>
          </div>
          <div className="flex flex-col gap-6">
            <Section title="Details">
              <Facts
                items={[
                  ['Billed to', invoice.growerName],
                  ['Issued', formatDate(invoice.issuedOn)],
                  ['Due', formatDate(invoice.dueOn)],
                  ...(invoice.paidAt
                    ? [['Paid', formatDateTime(invoice.paidAt)] as [string, string]]
                    : []),
                  ...(invoice.voidedAt
                    ? [['Voided', formatDateTime(invoice.voidedAt)] as [string, string]]
                    : []),
                ]}
              />
              {!grower && (
                <p className="mt-3">
                  <Link to={paths.contract(invoice.contractId)}>The contract</Link>
                </p>
              )}
            </Section>
            <Section title="Payments received">
              {invoice.payments.length === 0 ? (
                <p className="text-dusk-300">None yet.</p>
              ) : (
                <SimpleTable
                  caption="Payments received"
                  headers={['Received', 'Amount', ...(grower ? [] : ['Reference'])]}
                  rows={invoice.payments.map((p) => [
                    formatDateTime(p.receivedAt),
                    formatDollars(p.amountCents),
                    ...(grower ? [] : [p.providerReference ?? '—']),
                  ])}
                />
              )}
            </Section>
            {!grower && invoice.internalNotes && (
              <Section title="Internal notes">
                <p className="whitespace-pre-line">{invoice.internalNotes}</p>
              </Section>
            )}
          </div>
        </div>
      </div>
    </>
  );
}

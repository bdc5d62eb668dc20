import { cropName } from '@/lib/crops';
import { formatDate, formatDateTime, formatDollars } from '@/lib/units';
import type { InvoiceDetail } from '../types';
import { basisSentences } from './invoice-basis';
import { InvoiceLines } from './invoice-lines';
import { invoiceKindLabel, invoiceStatusLabel } from './invoice-status';
import './invoice-print.css';

/** One page an owner can print or a grower can file: parties, lines, totals, due date. */
export function PrintableInvoice({ invoice }: { invoice: InvoiceDetail }) {
  return (
    <article className="invoice-sheet" aria-label={`Invoice ${invoice.number}`}>
      <header className="flex flex-wrap items-start justify-between gap-6 border-b border-[#bbb] pb-5">
        <div>
          <p className="text-2xl font-semibold">{invoice.operationName}</p>
          <p className="invoice-muted">Honey bee pollination</p>
        </div>
        <div className="text-right">
          <p className="text-3xl font-semibold tracking-tight">Invoice {invoice.number}</p>
          {invoice.status !== 'sent' && (
            <p className="mt-1 font-semibold uppercase">{invoiceStatusLabel(invoice.status)}</p>
          )}
        </div>
      </header>
      <section className="grid gap-6 py-5 sm:grid-cols-2">
        <div>
          <h2 className="invoice-muted text-sm font-medium uppercase">Billed to</h2>
          <p className="font-semibold">{invoice.growerName}</p>
          {invoice.billingAddress && (
            <p className="whitespace-pre-line">{invoice.billingAddress}</p>
          )}
        </div>
        <dl className="grid grid-cols-2 gap-x-4 gap-y-1 self-start sm:justify-self-end">
          <dt className="invoice-muted">Issued</dt>
          <dd>{formatDate(invoice.issuedOn)}</dd>
          <dt className="invoice-muted">Due</dt>
          <dd className="font-semibold">{formatDate(invoice.dueOn)}</dd>
          <dt className="invoice-muted">For</dt>
          <dd>
            {cropName(invoice.crop)} {invoice.season},{' '}
            {invoiceKindLabel(invoice.kind).toLowerCase()}
          </dd>
        </dl>
      </section>
      <InvoiceLines invoice={invoice} />
      {basisSentences(invoice).length > 0 && (
        <section className="mt-6 text-sm">
          <h2 className="font-semibold">How this was worked out</h2>
          <ul className="mt-1 list-disc pl-5">
            {basisSentences(invoice).map((s) => (
              <li key={s}>{s}</li>
            ))}
          </ul>
        </section>
      )}
      {invoice.payments.length > 0 && (
        <section className="mt-6 text-sm">
          <h2 className="font-semibold">Payments received</h2>
          <ul className="mt-1">
            {invoice.payments.map((p) => (
              <li key={p.id}>
                {formatDateTime(p.receivedAt)}: {formatDollars(p.amountCents)}
              </li>
            ))}
          </ul>
        </section>
      )}
      <footer className="invoice-muted mt-8 border-t border-[#bbb] pt-4 text-sm">
        Please quote invoice {invoice.number} with your payment. Thank you for having our bees.
      </footer>
    </article>
  );
}

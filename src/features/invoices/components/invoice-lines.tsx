import { formatDollars } from '@/lib/units';
import type { Invoice } from '../types';

/** The invoice's lines, its total, what has been received and what is still owed. */
export function InvoiceLines({ invoice }: { invoice: Invoice }) {
  return (
    <table className="invoice-lines w-full border-collapse text-left">
      <caption className="sr-only">Invoice lines</caption>
      <thead>
        <tr className="border-b border-dusk-600 text-sm text-dusk-300">
          <th scope="col" className="py-2 pr-3 font-medium">
            Description
          </th>
          <th scope="col" className="py-2 text-right font-medium">
            Amount
          </th>
        </tr>
      </thead>
      <tbody>
        {invoice.lines.map((line, i) => (
          <tr key={i} className="border-b border-dusk-700">
            <td className="py-2 pr-3">{line.description}</td>
            <td className="py-2 text-right tabular-nums">{formatDollars(line.amountCents)}</td>
          </tr>
        ))}
      </tbody>
      <tfoot>
        <tr>
          <th scope="row" className="pt-3 pr-3 text-right font-semibold">
            Total
          </th>
          <td className="pt-3 text-right font-semibold tabular-nums" data-testid="invoice-total">
            {formatDollars(invoice.amountCents)}
          </td>
        </tr>
        {invoice.paidCents > 0 && (
          <tr>
            <th scope="row" className="pt-1 pr-3 text-right font-normal text-dusk-300">
              Received
            </th>
            <td className="pt-1 text-right tabular-nums">−{formatDollars(invoice.paidCents)}</td>
          </tr>
        )}
        {invoice.status !== 'void' && (
          <tr>
            <th scope="row" className="pt-1 pr-3 text-right font-semibold">
              Still owed
            </th>
            <td className="pt-1 text-right font-semibold tabular-nums" data-testid="invoice-owed">
              {formatDollars(invoice.outstandingCents)}
            </td>
          </tr>
        )}
      </tfoot>
    </table>
  );
}

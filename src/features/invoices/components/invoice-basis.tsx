import { formatCount, formatDollars } from '@/lib/units';
import type { Invoice } from '../types';

/** Plain sentences saying where the invoice's figures came from. */
export function basisSentences(invoice: Pick<Invoice, 'kind' | 'basis'>): string[] {
  const { basis } = invoice;
  if (invoice.kind === 'deposit')
    return ['The deposit agreed in the contract, due before the colonies go in.'];
  const said: string[] = [];
  if (basis.coloniesPlaced !== undefined)
    said.push(
      `${formatCount(basis.coloniesPlaced)} colonies placed: the most present at once at the contract’s sites during its delivery span, from the colony ledger${
        basis.feePerColonyCents !== undefined
          ? `, at ${formatDollars(basis.feePerColonyCents)} a colony`
          : ''
      }.`,
    );
  if (basis.strength) {
    const s = basis.strength;
    said.push(
      `Strength: ${formatCount(s.coloniesSampled)} colonies inspected averaged ${s.measuredAverageFrames.toFixed(2)} frames against the ${s.targetAverageFrames} agreed, at ${formatDollars(s.perFramePerColonyCents)} a frame per colony${
        s.reductionsOnly ? ' (the contract allows reductions only)' : ''
      }.`,
    );
  }
  if (basis.strengthNote) said.push(basis.strengthNote);
  if (basis.depositPaidCents)
    said.push(`Deposit already received: ${formatDollars(basis.depositPaidCents)}.`);
  return said;
}

/** How the invoice was worked out. */
export function InvoiceBasisNote({ invoice }: { invoice: Pick<Invoice, 'kind' | 'basis'> }) {
  const sentences = basisSentences(invoice);
  if (sentences.length === 0) return null;
  return (
    <ul className="flex list-disc flex-col gap-1 pl-5 text-sm text-dusk-200">
      {sentences.map((s) => (
        <li key={s}>{s}</li>
      ))}
    </ul>
  );
}

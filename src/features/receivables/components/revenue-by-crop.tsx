import { SimpleTable } from '@/components/ui/table';
import { formatCount, formatDollars } from '@/lib/units';
import type { Receivables } from '../types';

/** The season's sent and paid invoices by crop: billed and received. */
export function RevenueByCrop({
  receivables,
  cropName,
}: {
  receivables: Receivables;
  cropName: (crop: string) => string;
}) {
  const rows = receivables.revenueByCrop;
  if (rows.length === 0)
    return <p className="text-dusk-300">Nothing billed for {receivables.season} yet.</p>;
  const billed = rows.reduce((sum, r) => sum + r.invoicedCents, 0);
  const received = rows.reduce((sum, r) => sum + r.receivedCents, 0);
  return (
    <SimpleTable
      caption={`Revenue by crop, ${receivables.season}`}
      headers={['Crop', 'Invoices', 'Billed', 'Received']}
      rows={[
        ...rows.map((r) => [
          cropName(r.crop),
          formatCount(r.invoices),
          formatDollars(r.invoicedCents),
          formatDollars(r.receivedCents),
        ]),
        [
          <strong key="t">All crops</strong>,
          formatCount(rows.reduce((sum, r) => sum + r.invoices, 0)),
          <strong key="b">{formatDollars(billed)}</strong>,
          <strong key="r">{formatDollars(received)}</strong>,
        ],
      ]}
    />
  );
}

import type { ColonyCount } from '@shared/schemas/ledger';
import { EmptyState } from '@/components/ui/empty-state';
import { SimpleTable } from '@/components/ui/table';
import { formatCount } from '@/lib/units';

/** Colonies at one place by lot and box setup, with the total. */
export function ColonyCountsTable({
  counts,
  placeName,
  emptyHint,
}: {
  counts: ColonyCount[];
  placeName: string;
  emptyHint?: string;
}) {
  const here = counts.filter((c) => c.colonies !== 0);
  if (here.length === 0) {
    return (
      <EmptyState title={`No colonies at ${placeName} today`}>
        {emptyHint ?? 'Record a purchase or a split to add colonies here, or move colonies in.'}
      </EmptyState>
    );
  }
  const total = here.reduce((sum, c) => sum + c.colonies, 0);
  return (
    <SimpleTable
      caption={`Colonies at ${placeName} by lot`}
      headers={['Lot', 'Box setup', 'Colonies']}
      rows={[
        ...here.map((c) => [
          c.lotName,
          c.hiveSetupName,
          <span className="font-medium">{formatCount(c.colonies)}</span>,
        ]),
        [
          <span className="font-semibold">Total</span>,
          '',
          <span className="font-semibold">{formatCount(total)}</span>,
        ],
      ]}
    />
  );
}

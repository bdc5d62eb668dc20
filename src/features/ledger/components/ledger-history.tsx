import type { LedgerKind } from '@shared/schemas/ledger';
import { Badge } from '@/components/ui/badge';
import { EmptyState } from '@/components/ui/empty-state';
import { SimpleTable } from '@/components/ui/table';
import { formatCount, formatDate } from '@/lib/units';
import type { LedgerEntry } from '../api/get-ledger-entries';

const kindLabel: Record<LedgerKind, string> = {
  move: 'Move',
  loss: 'Loss',
  split: 'Split',
  purchase: 'Purchase',
  correction: 'Correction',
};

/** The entries that changed a place's count, newest first, signed from that place's side. */
export function LedgerHistory({
  entries,
  placeId,
  lotNames,
}: {
  entries: LedgerEntry[];
  placeId: string;
  lotNames: Record<string, string>;
}) {
  if (entries.length === 0) {
    return (
      <EmptyState title="No entries yet">
        Every loss, split, purchase, correction or move here will be listed.
      </EmptyState>
    );
  }
  return (
    <SimpleTable
      caption="Ledger history"
      headers={['Date', 'What', 'Lot', 'Change', 'Reason']}
      rows={entries.map((entry) => {
        const arriving = entry.to?.id === placeId;
        const change = arriving
          ? `+${formatCount(entry.colonies)}`
          : `−${formatCount(entry.colonies)}`;
        const label =
          entry.kind === 'move' ? (arriving ? 'Moved in' : 'Moved out') : kindLabel[entry.kind];
        return [
          <span className="whitespace-nowrap">{formatDate(entry.occurredOn)}</span>,
          <Badge tone={arriving ? 'green' : entry.kind === 'loss' ? 'red' : 'neutral'}>
            {label}
          </Badge>,
          lotNames[entry.lotId] ?? 'Lot',
          <span className={arriving ? 'font-medium text-sage-300' : 'font-medium text-rosehip-300'}>
            {change}
          </span>,
          entry.reason,
        ];
      })}
    />
  );
}

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { EmptyState } from '@/components/ui/empty-state';
import { FormAlert } from '@/components/ui/form-alert';
import { Section } from '@/components/ui/page-header';
import { TableSkeleton } from '@/components/ui/skeleton';
import { SimpleTable } from '@/components/ui/table';
import { useToast } from '@/components/ui/toast';
import { useArchiveColonyLot } from '../api/archive-colony-lot';
import { useColonyLots } from '../api/get-colony-lots';
import { useHiveSetups } from '../api/get-hive-setups';
import type { ColonyLot } from '../types';
import { ColonyLotForm, queenStatusLabels } from './colony-lot-form';

/** Colony lots: colonies kept alike (one box setup, one pallet size). Counts live in the ledger. */
export function ColonyLotsPanel({ canEdit }: { canEdit: boolean }) {
  const lots = useColonyLots();
  const setups = useHiveSetups();
  const archive = useArchiveColonyLot();
  const toast = useToast();
  const [editing, setEditing] = useState<ColonyLot | 'new' | null>(null);
  const setupName = (id: string) => setups.data?.items.find((s) => s.id === id)?.name ?? '—';
  const addButton = canEdit && <Button onClick={() => setEditing('new')}>Add lot</Button>;
  return (
    <Section title="Colony lots" actions={addButton}>
      <FormAlert error={archive.error} />
      {lots.isPending || setups.isPending ? (
        <TableSkeleton rows={3} label="Loading colony lots" />
      ) : lots.isError ? (
        <FormAlert error={lots.error} />
      ) : lots.data.items.length === 0 ? (
        <EmptyState title="No colony lots yet" action={addButton}>
          A lot groups colonies in the same box setup and pallet size. Add one, then record
          purchases or splits at a yard to give it colonies.
        </EmptyState>
      ) : (
        <SimpleTable
          caption="Colony lots"
          headers={[
            'Lot',
            'Box setup',
            'Colonies per pallet',
            'Queens',
            ...(canEdit ? [<span className="sr-only">Actions</span>] : []),
          ]}
          rows={lots.data.items.map((lot) => [
            <span className="font-medium">{lot.name}</span>,
            setupName(lot.hiveSetupId),
            lot.coloniesPerPallet,
            queenStatusLabels[lot.queenStatus] ?? lot.queenStatus,
            ...(canEdit
              ? [
                  <span className="flex gap-2">
                    <Button
                      size="sm"
                      variant="secondary"
                      onClick={() => setEditing(lot)}
                      aria-label={`Edit ${lot.name}`}
                    >
                      Edit
                    </Button>
                    <Button
                      size="sm"
                      variant="ghost"
                      aria-label={`Archive ${lot.name}`}
                      onClick={() =>
                        archive.mutate(
                          { id: lot.id, version: lot.version },
                          { onSuccess: () => toast.show(`${lot.name} archived.`) },
                        )
                      }
                    >
                      Archive
                    </Button>
                  </span>,
                ]
              : []),
          ])}
        />
      )}
      <Dialog
        open={editing !== null}
        title={editing === 'new' ? 'Add a colony lot' : `Edit ${editing?.name ?? ''}`}
        onClose={() => setEditing(null)}
      >
        {editing !== null && (
          <ColonyLotForm
            lot={editing === 'new' ? undefined : editing}
            setups={setups.data?.items ?? []}
            onCancel={() => setEditing(null)}
            onSaved={(lot) => {
              setEditing(null);
              toast.show(`${lot.name} saved.`);
            }}
          />
        )}
      </Dialog>
    </Section>
  );
}

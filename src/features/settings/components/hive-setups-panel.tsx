import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { EmptyState } from '@/components/ui/empty-state';
import { FormAlert } from '@/components/ui/form-alert';
import { Section } from '@/components/ui/page-header';
import { TableSkeleton } from '@/components/ui/skeleton';
import { SimpleTable } from '@/components/ui/table';
import { useToast } from '@/components/ui/toast';
import { useUnits } from '@/lib/auth';
import { formatWeight } from '@/lib/units';
import { useArchiveHiveSetup } from '../api/archive-hive-setup';
import { useHiveSetups } from '../api/get-hive-setups';
import type { HiveSetup } from '../types';
import { estimatedWeightKg, HiveSetupForm } from './hive-setup-form';

const describeBoxes = (setup: HiveSetup) =>
  setup.boxes.map((b) => `${b.size} ${Math.round(b.honeyFill * 100)}%`).join(' + ');

/** Box stacks the operation runs, with an estimated hive weight for each. */
export function HiveSetupsPanel({ canEdit }: { canEdit: boolean }) {
  const units = useUnits();
  const setups = useHiveSetups();
  const archive = useArchiveHiveSetup();
  const toast = useToast();
  const [editing, setEditing] = useState<HiveSetup | 'new' | null>(null);
  const addButton = canEdit && <Button onClick={() => setEditing('new')}>Add setup</Button>;
  return (
    <Section title="Hive setups" actions={addButton}>
      <FormAlert error={archive.error} />
      {setups.isPending ? (
        <TableSkeleton rows={3} label="Loading hive setups" />
      ) : setups.isError ? (
        <FormAlert error={setups.error} />
      ) : setups.data.items.length === 0 ? (
        <EmptyState title="No hive setups yet" action={addButton}>
          Add each box stack you run (a single deep, two deeps, deep and shallow) with how full of
          honey the boxes are.
        </EmptyState>
      ) : (
        <SimpleTable
          caption="Hive setups"
          headers={[
            'Setup',
            'Boxes (bottom first, honey fill)',
            'Estimated weight',
            ...(canEdit ? [<span className="sr-only">Actions</span>] : []),
          ]}
          rows={setups.data.items.map((s) => [
            <span className="font-medium">{s.name}</span>,
            <span className="capitalize">{describeBoxes(s)}</span>,
            formatWeight(estimatedWeightKg(s.boxes), units),
            ...(canEdit
              ? [
                  <span className="flex gap-2">
                    <Button
                      size="sm"
                      variant="secondary"
                      onClick={() => setEditing(s)}
                      aria-label={`Edit ${s.name}`}
                    >
                      Edit
                    </Button>
                    <Button
                      size="sm"
                      variant="ghost"
                      aria-label={`Archive ${s.name}`}
                      onClick={() =>
                        archive.mutate(
                          { id: s.id, version: s.version },
                          { onSuccess: () => toast.show(`${s.name} archived.`) },
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
        title={editing === 'new' ? 'Add a hive setup' : `Edit ${editing?.name ?? ''}`}
        onClose={() => setEditing(null)}
      >
        {editing !== null && (
          <HiveSetupForm
            setup={editing === 'new' ? undefined : editing}
            units={units}
            onCancel={() => setEditing(null)}
            onSaved={(setup) => {
              setEditing(null);
              toast.show(`${setup.name} saved.`);
            }}
          />
        )}
      </Dialog>
    </Section>
  );
}

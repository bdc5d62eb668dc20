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
import { useArchiveTruck } from '../api/archive-truck';
import { useTrucks } from '../api/get-trucks';
import type { Truck } from '../types';
import { TruckForm } from './truck-form';

/** The fleet: what each truck may carry. Only the owner changes it. */
export function FleetPanel({ canEdit }: { canEdit: boolean }) {
  const units = useUnits();
  const trucks = useTrucks();
  const archive = useArchiveTruck();
  const toast = useToast();
  const [editing, setEditing] = useState<Truck | 'new' | null>(null);

  const addButton = canEdit && <Button onClick={() => setEditing('new')}>Add truck</Button>;
  return (
    <Section title="Fleet" actions={addButton}>
      {!canEdit && <p className="mb-3 text-sm text-dusk-300">Only the owner changes the fleet.</p>}
      <FormAlert error={archive.error} />
      {trucks.isPending ? (
        <TableSkeleton rows={3} label="Loading trucks" />
      ) : trucks.isError ? (
        <FormAlert error={trucks.error} />
      ) : trucks.data.items.length === 0 ? (
        <EmptyState title="No trucks yet" action={addButton}>
          Add each truck with its legal payload, pallet spots and tare, so loads can be planned
          within its weight.
        </EmptyState>
      ) : (
        <SimpleTable
          caption="Trucks"
          headers={[
            'Truck',
            'Legal payload',
            'Pallet spots',
            'Tiers',
            'Tare',
            'Legal gross',
            ...(canEdit ? [<span className="sr-only">Actions</span>] : []),
          ]}
          rows={trucks.data.items.map((t) => [
            <span className="font-medium">{t.name}</span>,
            formatWeight(t.payloadKg, units),
            t.palletSpots,
            t.tiers,
            formatWeight(t.tareKg, units),
            formatWeight(t.legalGrossKg, units),
            ...(canEdit
              ? [
                  <span className="flex gap-2">
                    <Button
                      size="sm"
                      variant="secondary"
                      onClick={() => setEditing(t)}
                      aria-label={`Edit ${t.name}`}
                    >
                      Edit
                    </Button>
                    <Button
                      size="sm"
                      variant="ghost"
                      aria-label={`Archive ${t.name}`}
                      onClick={() =>
                        archive.mutate(
                          { id: t.id, version: t.version },
                          { onSuccess: () => toast.show(`${t.name} archived.`) },
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
        title={editing === 'new' ? 'Add a truck' : `Edit ${editing?.name ?? ''}`}
        onClose={() => setEditing(null)}
      >
        {editing !== null && (
          <TruckForm
            truck={editing === 'new' ? undefined : editing}
            units={units}
            onCancel={() => setEditing(null)}
            onSaved={(truck) => {
              setEditing(null);
              toast.show(`${truck.name} saved.`);
            }}
          />
        )}
      </Dialog>
    </Section>
  );
}

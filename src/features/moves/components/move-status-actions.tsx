import { useState } from 'react';
import { moveTransitions, type MoveStatus } from '@shared/schemas/moves';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { FormAlert } from '@/components/ui/form-alert';
import { useChangeMoveStatus } from '../api/change-move-status';
import type { Move } from '../types';

const actionLabels: Partial<Record<MoveStatus, string>> = {
  planned: 'Plan this move',
  draft: 'Back to draft',
  loading: 'Start loading',
  rolling: 'Rolling',
  placed: 'Placed',
  closed: 'Close the move',
  cancelled: 'Cancel the move',
};

/** Buttons for the statuses that may follow this one; crew cannot plan, unplan or cancel. */
export function MoveStatusActions({
  move,
  canPlan,
  onReload,
}: {
  move: Move;
  canPlan: boolean;
  onReload: () => void;
}) {
  const change = useChangeMoveStatus();
  const [confirm, setConfirm] = useState<MoveStatus | null>(null);
  const next = moveTransitions[move.status].filter(
    (s) => canPlan || !['planned', 'draft', 'cancelled', 'closed'].includes(s),
  );
  if (next.length === 0) return null;
  const go = (status: MoveStatus) =>
    change.mutate(
      { id: move.id, version: move.version, status },
      { onSuccess: () => setConfirm(null) },
    );
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap gap-2">
        {next.map((status) => (
          <Button
            key={status}
            variant={status === 'cancelled' ? 'danger' : status === 'draft' ? 'ghost' : 'primary'}
            busy={change.isPending && change.variables?.status === status}
            onClick={() =>
              status === 'cancelled' || status === 'placed' ? setConfirm(status) : go(status)
            }
          >
            {actionLabels[status]}
          </Button>
        ))}
      </div>
      {!confirm && <FormAlert error={change.error} onReload={onReload} />}
      <Dialog
        open={confirm !== null}
        title={confirm === 'cancelled' ? `Cancel ${move.name}?` : `Mark ${move.name} placed?`}
        onClose={() => setConfirm(null)}
      >
        <p className="text-dusk-100">
          {confirm === 'cancelled'
            ? 'Its colonies are no longer promised to it. This cannot be undone.'
            : 'The colonies leave their yards and arrive at the destination in the ledger.'}
        </p>
        <FormAlert error={change.error} onReload={onReload} />
        <div className="mt-4 flex gap-2">
          <Button
            variant={confirm === 'cancelled' ? 'danger' : 'primary'}
            busy={change.isPending}
            onClick={() => confirm && go(confirm)}
          >
            {confirm === 'cancelled' ? 'Cancel the move' : 'Mark placed'}
          </Button>
          <Button variant="ghost" onClick={() => setConfirm(null)}>
            Go back
          </Button>
        </div>
      </Dialog>
    </div>
  );
}

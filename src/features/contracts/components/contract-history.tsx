import { formatDateTime } from '@/lib/units';
import type { ContractStatus } from '@shared/schemas/contracts';
import type { ContractEvent } from '../types';
import { statusLabels } from '../types';

const label = (status: unknown) => statusLabels[status as ContractStatus] ?? String(status);

function describe(event: ContractEvent): string {
  switch (event.kind) {
    case 'created':
      return event.detail.status ? `Created as ${label(event.detail.status)}.` : 'Created.';
    case 'status-changed':
      return `Status changed from ${label(event.detail.from)} to ${label(event.detail.to)}.`;
    case 'edited': {
      const fields = Array.isArray(event.detail.fields) ? (event.detail.fields as string[]) : [];
      return fields.length ? `Edited: ${fields.join(', ')}.` : 'Edited.';
    }
    case 'archived':
      return 'Archived.';
    default:
      return event.kind.replace(/-/g, ' ');
  }
}

/** What happened to a contract, newest first. */
export function ContractHistory({ events }: { events: ContractEvent[] }) {
  if (events.length === 0) return <p className="text-dusk-300">Nothing recorded yet.</p>;
  return (
    <ol className="flex flex-col gap-3">
      {[...events].reverse().map((event) => (
        <li key={event.id} className="border-l-2 border-ember-600 pl-3">
          <p className="text-dusk-50">{describe(event)}</p>
          <p className="text-sm text-dusk-300">{formatDateTime(event.occurredAt)}</p>
        </li>
      ))}
    </ol>
  );
}

import { EmptyState } from '@/components/ui/empty-state';
import type { GrowerContact } from '../types';

/** A grower's contacts with tap-to-call and e-mail links. */
export function GrowerContacts({ contacts }: { contacts: GrowerContact[] }) {
  if (contacts.length === 0)
    return (
      <EmptyState title="No contacts yet">
        Edit the grower to add who confirms dates and hears about sprays.
      </EmptyState>
    );
  return (
    <ul className="grid gap-3 sm:grid-cols-2">
      {contacts.map((c) => (
        <li key={c.id} className="rounded-lg bg-dusk-900 p-3 ring-1 ring-dusk-700">
          <p className="font-medium text-dusk-50">{c.name}</p>
          {c.title && <p className="text-sm text-dusk-300">{c.title}</p>}
          {c.phone && (
            <p>
              <a href={`tel:${c.phone}`}>{c.phone}</a>
            </p>
          )}
          {c.email && (
            <p>
              <a href={`mailto:${c.email}`}>{c.email}</a>
            </p>
          )}
        </li>
      ))}
    </ul>
  );
}

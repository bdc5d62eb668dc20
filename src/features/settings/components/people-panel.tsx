import { useState } from 'react';
import { roles, type Role } from '@shared/schemas/users';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { FormAlert } from '@/components/ui/form-alert';
import { Select } from '@/components/ui/input';
import { Section } from '@/components/ui/page-header';
import { TableSkeleton } from '@/components/ui/skeleton';
import { SimpleTable } from '@/components/ui/table';
import { useToast } from '@/components/ui/toast';
import { useUser } from '@/lib/auth';
import { usePeople } from '../api/get-people';
import { useUpdatePerson } from '../api/update-person';
import { InvitePersonForm, roleLabels } from './invite-person-form';

/** The operation's people: invite, change role, deactivate or reactivate (owner only). */
export function PeoplePanel({ growers }: { growers: Array<{ id: string; name: string }> }) {
  const me = useUser();
  const people = usePeople();
  const update = useUpdatePerson();
  const toast = useToast();
  const [inviting, setInviting] = useState(false);
  const growerName = (id: string | null) => growers.find((g) => g.id === id)?.name;

  return (
    <Section
      title="People"
      actions={<Button onClick={() => setInviting(true)}>Invite person</Button>}
    >
      <FormAlert error={update.error} />
      {people.isPending ? (
        <TableSkeleton rows={4} label="Loading people" />
      ) : people.isError ? (
        <FormAlert error={people.error} />
      ) : (
        <SimpleTable
          caption="People"
          headers={['Name', 'E-mail', 'Role', 'Status', <span className="sr-only">Actions</span>]}
          rows={people.data.items.map((person) => {
            const self = person.id === me.id;
            return [
              <span className="font-medium">
                {person.name}
                {self && <span className="text-dusk-300"> (you)</span>}
                {person.role === 'grower' && growerName(person.growerId) && (
                  <span className="block text-sm text-dusk-300">
                    for {growerName(person.growerId)}
                  </span>
                )}
              </span>,
              <span className="break-all">{person.email}</span>,
              self || person.role === 'grower' ? (
                roleLabels[person.role]
              ) : (
                <Select
                  aria-label={`Role of ${person.name}`}
                  className="min-w-32"
                  value={person.role}
                  onChange={(e) => {
                    const role = e.target.value as Role;
                    update.mutate(
                      { id: person.id, version: person.version, role },
                      {
                        onSuccess: () =>
                          toast.show(`${person.name} is now ${roleLabels[role].toLowerCase()}.`),
                      },
                    );
                  }}
                >
                  {roles
                    .filter((r) => r !== 'grower')
                    .map((r) => (
                      <option key={r} value={r}>
                        {roleLabels[r]}
                      </option>
                    ))}
                </Select>
              ),
              person.active ? (
                <Badge tone="green">Active</Badge>
              ) : (
                <Badge tone="red">Deactivated</Badge>
              ),
              self ? null : person.active ? (
                <Button
                  size="sm"
                  variant="danger"
                  onClick={() =>
                    update.mutate(
                      { id: person.id, version: person.version, active: false },
                      { onSuccess: () => toast.show(`${person.name} deactivated and signed out.`) },
                    )
                  }
                >
                  Deactivate
                </Button>
              ) : (
                <Button
                  size="sm"
                  variant="secondary"
                  onClick={() =>
                    update.mutate(
                      { id: person.id, version: person.version, active: true },
                      { onSuccess: () => toast.show(`${person.name} can sign in again.`) },
                    )
                  }
                >
                  Reactivate
                </Button>
              ),
            ];
          })}
        />
      )}
      <Dialog open={inviting} title="Invite a person" onClose={() => setInviting(false)}>
        {inviting && (
          <InvitePersonForm
            growers={growers}
            onCancel={() => setInviting(false)}
            onSaved={(person) => {
              setInviting(false);
              toast.show(`${person.name} can now sign in as ${person.email}.`);
            }}
          />
        )}
      </Dialog>
    </Section>
  );
}

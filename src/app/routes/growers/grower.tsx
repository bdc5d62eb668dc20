import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { ButtonLink } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader, Section } from '@/components/ui/page-header';
import { getContractsQueryOptions } from '@/features/contracts/api/get-contracts';
import { ContractsTable } from '@/features/contracts/components/contracts-table';
import { getGrowerQueryOptions } from '@/features/growers/api/get-grower';
import { GrowerContacts } from '@/features/growers/components/grower-contacts';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    const id = params.growerId!;
    await Promise.all([
      queryClient.ensureQueryData(getGrowerQueryOptions(id)),
      queryClient.ensureQueryData(getContractsQueryOptions({ growerId: id })),
    ]);
    return null;
  };

/** /growers/:growerId: contacts, billing, notes and the grower's contracts. */
export function GrowerRoute() {
  const id = useParams().growerId!;
  const { data: grower } = useSuspenseQuery(getGrowerQueryOptions(id));
  const { data: contracts } = useSuspenseQuery(getContractsQueryOptions({ growerId: id }));
  return (
    <>
      <PageHeader
        title={grower.name}
        back={<Link to={paths.growers}>← All growers</Link>}
        actions={
          <>
            <ButtonLink to={`${paths.contractNew}?growerId=${id}`}>Add contract</ButtonLink>
            <ButtonLink variant="secondary" to={paths.growerEdit(id)}>
              Edit grower
            </ButtonLink>
          </>
        }
      />
      <div className="flex flex-col gap-6">
        <Section title="Contacts">
          <GrowerContacts contacts={grower.contacts} />
        </Section>
        <Section title="Contracts">
          {contracts.items.length === 0 ? (
            <EmptyState
              title="No contracts with this grower yet"
              action={
                <ButtonLink to={`${paths.contractNew}?growerId=${id}`}>Add contract</ButtonLink>
              }
            />
          ) : (
            <ContractsTable
              contracts={contracts.items}
              growerNames={{ [grower.id]: grower.name }}
              caption={`Contracts with ${grower.name}`}
            />
          )}
        </Section>
        <div className="grid gap-6 sm:grid-cols-2">
          <Section title="Billing address">
            <p className="whitespace-pre-line">{grower.billingAddress || 'None written yet.'}</p>
          </Section>
          <Section title="Internal notes">
            <p className="whitespace-pre-line">{grower.internalNotes || 'None written yet.'}</p>
          </Section>
        </div>
      </div>
    </>
  );
}

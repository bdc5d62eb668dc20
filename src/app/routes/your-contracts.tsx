import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader, Section } from '@/components/ui/page-header';
import { getContractsQueryOptions } from '@/features/contracts/api/get-contracts';
import { ContractSummary } from '@/features/contracts/components/contract-summary';
import { getGrowersQueryOptions } from '@/features/growers/api/get-growers';
import { getSitesQueryOptions } from '@/features/sites/api/get-sites';
import { useUser } from '@/lib/auth';
import { cropName } from '@/lib/crops';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['grower']);
    await Promise.all([
      queryClient.ensureQueryData(getContractsQueryOptions()),
      queryClient.ensureQueryData(getGrowersQueryOptions()),
      queryClient.ensureQueryData(getSitesQueryOptions()),
    ]);
    return null;
  };

/** /your-contracts: a grower's own contracts with the beekeeping operation. */
export function YourContractsRoute() {
  const user = useUser();
  const { data } = useSuspenseQuery(getContractsQueryOptions());
  const { data: growers } = useSuspenseQuery(getGrowersQueryOptions());
  const { data: sites } = useSuspenseQuery(getSitesQueryOptions());
  const growerName = growers.items[0]?.name ?? user.name;
  const contracts = [...data.items].sort((a, b) =>
    b.deliveryStartOn.localeCompare(a.deliveryStartOn),
  );
  return (
    <>
      <PageHeader
        title="Your contracts"
        description={`Pollination contracts between ${growerName} and ${user.operationName}.`}
      />
      {contracts.length === 0 ? (
        <EmptyState title="No contracts yet">
          When {user.operationName} sends you a contract, it will be listed here.
        </EmptyState>
      ) : (
        <ul className="flex flex-col gap-4" aria-label="Your contracts">
          {contracts.map((contract) => (
            <li key={contract.id}>
              <Section title={`${cropName(contract.crop)} ${contract.season}`}>
                <ContractSummary
                  contract={contract}
                  growerName={growerName}
                  siteNames={contract.siteIds.map(
                    (id) => sites.items.find((s) => s.id === id)?.name ?? 'Site',
                  )}
                />
                {contract.terms && (
                  <p className="mt-4 whitespace-pre-line text-dusk-200">{contract.terms}</p>
                )}
              </Section>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}

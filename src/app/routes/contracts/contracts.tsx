import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { contractStatuses, type ContractStatus } from '@shared/schemas/contracts';
import { cropKeys, type CropKey } from '@shared/schemas/sites';
import { paths } from '@/config/paths';
import { SectionTabs } from '@/components/layouts/section-tabs';
import { ButtonLink } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { getContractsQueryOptions } from '@/features/contracts/api/get-contracts';
import { ContractFilters } from '@/features/contracts/components/contract-filters';
import { ContractsTable } from '@/features/contracts/components/contracts-table';
import type { ContractFilters as Filters } from '@/features/contracts/types';
import { getGrowersQueryOptions } from '@/features/growers/api/get-growers';
import { canPlan, useUser } from '@/lib/auth';
import { requireRole } from '@/lib/route-guards';

/** Filters from the address, so a filtered list can be bookmarked or shared. */
function filtersFrom(params: URLSearchParams): Filters {
  const status = params.get('status');
  const crop = params.get('crop');
  const season = Number(params.get('season'));
  return {
    ...(status && (contractStatuses as readonly string[]).includes(status)
      ? { status: status as ContractStatus }
      : {}),
    ...(crop && (cropKeys as readonly string[]).includes(crop) ? { crop: crop as CropKey } : {}),
    ...(Number.isInteger(season) && season >= 2000 && season <= 2100 ? { season } : {}),
  };
}

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner', 'crew']);
    const filters = filtersFrom(new URL(request.url).searchParams);
    await Promise.all([
      queryClient.ensureQueryData(getContractsQueryOptions(filters)),
      queryClient.ensureQueryData(getGrowersQueryOptions()),
    ]);
    return null;
  };

/** /contracts: pollination contracts, filtered by status, crop and season. */
export function ContractsRoute() {
  const user = useUser();
  const planner = canPlan(user);
  const [params, setParams] = useSearchParams();
  const filters = filtersFrom(params);
  const { data } = useSuspenseQuery(getContractsQueryOptions(filters));
  const { data: growers } = useSuspenseQuery(getGrowersQueryOptions());
  const growerNames = Object.fromEntries(growers.items.map((g) => [g.id, g.name]));
  const filtered = Object.keys(filters).length > 0;

  const setFilters = (next: Filters) => {
    const search = new URLSearchParams();
    for (const [key, value] of Object.entries(next))
      if (value !== undefined) search.set(key, String(value));
    setParams(search, { replace: true });
  };

  return (
    <>
      <PageHeader
        title={planner ? 'Growers & contracts' : 'Contracts'}
        description={
          planner
            ? 'Who ordered colonies, where, when, and on what terms.'
            : 'Where colonies are ordered and when they go in and come out.'
        }
        actions={planner && <ButtonLink to={paths.contractNew}>Add contract</ButtonLink>}
      />
      {planner && (
        <SectionTabs
          label="Growers and contracts"
          items={[
            { to: paths.contracts, label: 'Contracts' },
            { to: paths.growers, label: 'Growers' },
          ]}
        />
      )}
      <div className="flex flex-col gap-4">
        <ContractFilters value={filters} onChange={setFilters} />
        {data.items.length === 0 && !filtered ? (
          <EmptyState
            title="No contracts yet"
            action={planner && <ButtonLink to={paths.contractNew}>Add contract</ButtonLink>}
          >
            {planner
              ? 'Add a grower first, then a contract for their blocks: colonies, strength, dates and fee.'
              : 'The office has not added any contracts yet.'}
          </EmptyState>
        ) : (
          <ContractsTable contracts={data.items} growerNames={growerNames} />
        )}
      </div>
    </>
  );
}

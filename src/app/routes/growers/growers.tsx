import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { SectionTabs } from '@/components/layouts/section-tabs';
import { ButtonLink } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { getGrowersQueryOptions } from '@/features/growers/api/get-growers';
import { GrowersTable } from '@/features/growers/components/growers-table';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    await queryClient.ensureQueryData(getGrowersQueryOptions());
    return null;
  };

/** /growers: the operation's customers and their contacts. */
export function GrowersRoute() {
  const { data } = useSuspenseQuery(getGrowersQueryOptions());
  return (
    <>
      <PageHeader
        title="Growers & contracts"
        description="The growers who rent colonies, and who to call at each."
        actions={<ButtonLink to={paths.growerNew}>Add grower</ButtonLink>}
      />
      <SectionTabs
        label="Growers and contracts"
        items={[
          { to: paths.contracts, label: 'Contracts' },
          { to: paths.growers, label: 'Growers' },
        ]}
      />
      {data.items.length === 0 ? (
        <EmptyState
          title="No growers yet"
          action={<ButtonLink to={paths.growerNew}>Add grower</ButtonLink>}
        >
          Add the growers who rent your colonies, with the people who confirm dates and hear about
          sprays.
        </EmptyState>
      ) : (
        <GrowersTable growers={data.items} />
      )}
    </>
  );
}

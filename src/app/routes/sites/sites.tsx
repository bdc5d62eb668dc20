import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { ButtonLink } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { getGrowersQueryOptions } from '@/features/growers/api/get-growers';
import { getSitesQueryOptions } from '@/features/sites/api/get-sites';
import { SitesTable } from '@/features/sites/components/sites-table';
import { useUnits } from '@/lib/auth';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    await Promise.all([
      queryClient.ensureQueryData(getSitesQueryOptions()),
      queryClient.ensureQueryData(getGrowersQueryOptions()),
    ]);
    return null;
  };

/** /sites: orchard blocks, seed fields and honey locations. */
export function SitesRoute() {
  const units = useUnits();
  const { data } = useSuspenseQuery(getSitesQueryOptions());
  const { data: growers } = useSuspenseQuery(getGrowersQueryOptions());
  const growerNames = Object.fromEntries(growers.items.map((g) => [g.id, g.name]));
  return (
    <>
      <PageHeader
        title="Sites"
        description="Where colonies are sent: growers' blocks and fields, and honey locations."
        actions={<ButtonLink to={paths.siteNew}>Add site</ButtonLink>}
      />
      {data.items.length === 0 ? (
        <EmptyState
          title="No sites yet"
          action={<ButtonLink to={paths.siteNew}>Add site</ButtonLink>}
        >
          Add a grower's orchard block or seed field (paste its boundary to get the acreage), or a
          honey location.
        </EmptyState>
      ) : (
        <SitesTable sites={data.items} growerNames={growerNames} units={units} />
      )}
    </>
  );
}

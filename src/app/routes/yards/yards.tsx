import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { ButtonLink } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { getYardsQueryOptions } from '@/features/yards/api/get-yards';
import { YardsTable } from '@/features/yards/components/yards-table';
import { canPlan, useUser } from '@/lib/auth';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner', 'crew']);
    await queryClient.ensureQueryData(getYardsQueryOptions());
    return null;
  };

/** /yards: every holding yard and what is in it today. */
export function YardsRoute() {
  const user = useUser();
  const { data } = useSuspenseQuery(getYardsQueryOptions());
  const planner = canPlan(user);
  return (
    <>
      <PageHeader
        title="Yards"
        description="Holding yards and the colonies in each today, by box setup."
        actions={planner && <ButtonLink to={paths.yardNew}>Add yard</ButtonLink>}
      />
      {data.items.length === 0 ? (
        <EmptyState
          title="No yards yet"
          action={planner && <ButtonLink to={paths.yardNew}>Add yard</ButtonLink>}
        >
          {planner
            ? 'Add your first holding yard: its location, capacity and the access notes a driver needs at night.'
            : 'The office has not added any yards yet.'}
        </EmptyState>
      ) : (
        <YardsTable yards={data.items} />
      )}
    </>
  );
}

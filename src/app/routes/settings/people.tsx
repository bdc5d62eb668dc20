import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { getGrowersQueryOptions } from '@/features/growers/api/get-growers';
import { getPeopleQueryOptions } from '@/features/settings/api/get-people';
import { PeoplePanel } from '@/features/settings/components/people-panel';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner']);
    await Promise.all([
      queryClient.ensureQueryData(getPeopleQueryOptions()),
      queryClient.ensureQueryData(getGrowersQueryOptions()),
    ]);
    return null;
  };

/** /settings/people (owner only) */
export function SettingsPeopleRoute() {
  const { data: growers } = useSuspenseQuery(getGrowersQueryOptions());
  return <PeoplePanel growers={growers.items} />;
}

import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { getColonyLotsQueryOptions } from '@/features/settings/api/get-colony-lots';
import { getHiveSetupsQueryOptions } from '@/features/settings/api/get-hive-setups';
import { ColonyLotsPanel } from '@/features/settings/components/colony-lots-panel';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    await Promise.all([
      queryClient.ensureQueryData(getColonyLotsQueryOptions()),
      queryClient.ensureQueryData(getHiveSetupsQueryOptions()),
    ]);
    return null;
  };

/** /settings/colony-lots */
export function SettingsColonyLotsRoute() {
  return <ColonyLotsPanel canEdit />;
}

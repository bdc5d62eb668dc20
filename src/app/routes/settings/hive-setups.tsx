import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { getHiveSetupsQueryOptions } from '@/features/settings/api/get-hive-setups';
import { HiveSetupsPanel } from '@/features/settings/components/hive-setups-panel';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    await queryClient.ensureQueryData(getHiveSetupsQueryOptions());
    return null;
  };

/** /settings/hive-setups */
export function SettingsHiveSetupsRoute() {
  return <HiveSetupsPanel canEdit />;
}

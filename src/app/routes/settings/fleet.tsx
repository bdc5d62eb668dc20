import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { getTrucksQueryOptions } from '@/features/settings/api/get-trucks';
import { FleetPanel } from '@/features/settings/components/fleet-panel';
import { useUser } from '@/lib/auth';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    await queryClient.ensureQueryData(getTrucksQueryOptions());
    return null;
  };

/** /settings/fleet */
export function SettingsFleetRoute() {
  return <FleetPanel canEdit={useUser().role === 'owner'} />;
}

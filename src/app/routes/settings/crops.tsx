import type { QueryClient } from '@tanstack/react-query';
import { useQuery } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { EmptyState } from '@/components/ui/empty-state';
import { TableSkeleton } from '@/components/ui/skeleton';
import { getCropsQueryOptions } from '@/features/settings/api/get-crops';
import { CropRatesPanel } from '@/features/settings/components/crop-rates-panel';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    return null;
  };

/** /settings/crops: shown in the tabs only when the API offers crop rates. */
export function SettingsCropsRoute() {
  const crops = useQuery(getCropsQueryOptions());
  if (crops.isPending) return <TableSkeleton rows={6} label="Loading crop rates" />;
  if (!crops.data)
    return (
      <EmptyState title="Crop stocking rates are not available yet">
        This server does not offer them yet.
      </EmptyState>
    );
  return <CropRatesPanel crops={crops.data} />;
}

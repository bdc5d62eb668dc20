import type { QueryClient } from '@tanstack/react-query';
import { lazy, Suspense } from 'react';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { RouteError } from '@/components/errors/route-error';
import { PageSkeleton } from '@/components/ui/skeleton';
import { getAtlasQueryOptions } from '@/features/atlas/api/get-atlas';
import { getTileSetQueryOptions } from '@/features/atlas/api/get-tile-set';
import { useUser } from '@/lib/auth';
import { requireRole } from '@/lib/route-guards';
import { todayIso } from '@/lib/units';

// Leaflet, the tile renderer and the drawing tools load with the Atlas, not with every screen.
const AtlasScreen = lazy(() =>
  import('@/features/atlas/components/atlas-screen').then((module) => ({
    default: module.AtlasScreen,
  })),
);

/** Staff only: growers have their own portal. Today's positions are loaded before the map. */
export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner', 'crew']);
    await Promise.all([
      queryClient.ensureQueryData(getAtlasQueryOptions(todayIso())),
      queryClient.prefetchQuery(getTileSetQueryOptions()),
    ]);
    return null;
  };

/** /atlas: the season on the map. */
export function AtlasRoute() {
  const user = useUser();
  return (
    <Suspense fallback={<PageSkeleton />}>
      <AtlasScreen user={user} units={user.units} />
    </Suspense>
  );
}

/** The route object for the router, under the signed-in layout: `atlasRoute(queryClient)`. */
export const atlasRoute = (queryClient: QueryClient) => ({
  path: 'atlas',
  loader: loader(queryClient),
  element: <AtlasRoute />,
  errorElement: <RouteError />,
});

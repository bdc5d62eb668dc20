import type { QueryClient } from '@tanstack/react-query';
import { Suspense } from 'react';
import { Outlet, type LoaderFunctionArgs } from 'react-router-dom';
import { AppLayout } from '@/components/layouts/app-layout';
import { PageSkeleton } from '@/components/ui/skeleton';
import { requireUser } from '@/lib/route-guards';

/** Everything behind sign-in. */
export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    return null;
  };

export function AppRootRoute() {
  return (
    <AppLayout>
      <Suspense fallback={<PageSkeleton />}>
        <Outlet />
      </Suspense>
    </AppLayout>
  );
}

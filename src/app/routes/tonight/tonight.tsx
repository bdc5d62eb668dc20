import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { getTonightQueryOptions } from '@/features/tonight/api/get-tonight';
import { TonightScreen } from '@/features/tonight/components/tonight-screen';
import { deviceStorage } from '@/features/tonight/lib/storage';
import { TonightProvider } from '@/features/tonight/lib/tonight-context';
import { useUser } from '@/lib/auth';
import { requireRole } from '@/lib/route-guards';
import { todayIso } from '@/lib/units';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner', 'crew']);
    // Never blocks: without signal and with nothing kept, the screen says so itself.
    await queryClient
      .ensureQueryData(getTonightQueryOptions(todayIso(), deviceStorage()))
      .catch(() => null);
    return null;
  };

/** /tonight: the crew's night, on a phone, with or without signal. */
export function TonightRoute() {
  const user = useUser();
  return (
    <TonightProvider>
      <TonightScreen today={todayIso()} units={user.units} />
    </TonightProvider>
  );
}

import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { getGrowersQueryOptions } from '@/features/growers/api/get-growers';
import { getSitesQueryOptions } from '@/features/sites/api/get-sites';
import { getSprayNoticesQueryOptions } from '@/features/spray-notices/api/get-spray-notices';
import { SprayCaution } from '@/features/spray-notices/components/spray-caution';
import { StaffSprayNotices } from '@/features/spray-notices/components/staff-spray-notices';
import { useUser } from '@/lib/auth';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner', 'crew']);
    await Promise.all([
      queryClient.ensureQueryData(getSprayNoticesQueryOptions()),
      queryClient.ensureQueryData(getSitesQueryOptions()),
      queryClient.ensureQueryData(getGrowersQueryOptions()),
    ]);
    return null;
  };

/** /spray-notices: growers' planned sprays; owners and planners acknowledge with an action. */
export function SprayNoticesRoute() {
  const user = useUser();
  const { data: notices } = useSuspenseQuery(getSprayNoticesQueryOptions());
  const { data: sites } = useSuspenseQuery(getSitesQueryOptions());
  const { data: growers } = useSuspenseQuery(getGrowersQueryOptions());
  const waiting = notices.items.filter((n) => n.status === 'filed' && !n.archivedAt).length;
  return (
    <>
      <PageHeader
        title="Spray notices"
        description={
          waiting > 0
            ? `${waiting} waiting for an answer. Growers see the action you record, not your note.`
            : 'Every notice has been answered.'
        }
      />
      <div className="flex flex-col gap-4">
        <SprayCaution caution={notices.caution} />
        <StaffSprayNotices
          notices={notices.items}
          siteName={(id) => sites.items.find((s) => s.id === id)?.name ?? 'Site'}
          growerName={(id) => growers.items.find((g) => g.id === id)?.name ?? 'Grower'}
          canAcknowledge={user.role === 'owner' || user.role === 'planner'}
        />
      </div>
    </>
  );
}

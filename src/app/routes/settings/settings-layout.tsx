import type { QueryClient } from '@tanstack/react-query';
import { useQuery } from '@tanstack/react-query';
import { Outlet, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { SectionTabs } from '@/components/layouts/section-tabs';
import { PageHeader } from '@/components/ui/page-header';
import { getCropsQueryOptions } from '@/features/settings/api/get-crops';
import { useUser } from '@/lib/auth';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const user = await requireRole(queryClient, request, ['owner', 'planner', 'crew']);
    // Crop rates come from another part of the API that may not be there yet: never block on it.
    if (user.role !== 'crew')
      await queryClient.ensureQueryData(getCropsQueryOptions()).catch(() => null);
    return null;
  };

/** /settings: the tabs each role may open. */
export function SettingsLayoutRoute() {
  const user = useUser();
  const crops = useQuery({ ...getCropsQueryOptions(), enabled: user.role !== 'crew' });
  const staff = user.role === 'owner' || user.role === 'planner';
  const items = [
    { to: paths.settingsUnits, label: 'Units' },
    ...(staff
      ? [
          { to: paths.settingsFleet, label: 'Fleet' },
          { to: paths.settingsHiveSetups, label: 'Hive setups' },
          { to: paths.settingsColonyLots, label: 'Colony lots' },
        ]
      : []),
    ...(staff && crops.data ? [{ to: paths.settingsCrops, label: 'Crop stocking rates' }] : []),
    ...(user.role === 'owner' ? [{ to: paths.settingsPeople, label: 'People' }] : []),
    { to: paths.settingsCalendar, label: 'Calendar' },
  ];
  return (
    <>
      <PageHeader title="Settings" />
      <SectionTabs label="Settings" items={items} />
      <Outlet />
    </>
  );
}

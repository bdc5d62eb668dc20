import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useNavigate, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PageHeader } from '@/components/ui/page-header';
import { useToast } from '@/components/ui/toast';
import { getGrowersQueryOptions } from '@/features/growers/api/get-growers';
import { SiteForm } from '@/features/sites/components/site-form';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    await queryClient.ensureQueryData(getGrowersQueryOptions());
    return null;
  };

/** /sites/new */
export function SiteNewRoute() {
  const navigate = useNavigate();
  const toast = useToast();
  const { data: growers } = useSuspenseQuery(getGrowersQueryOptions());
  return (
    <>
      <PageHeader title="Add a site" back={<Link to={paths.sites}>← All sites</Link>} />
      <SiteForm
        growers={growers.items}
        onCancel={() => navigate(paths.sites)}
        onSaved={(site) => {
          toast.show(`${site.name} added.`);
          navigate(paths.site(site.id));
        }}
      />
    </>
  );
}

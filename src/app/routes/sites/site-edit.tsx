import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PageHeader } from '@/components/ui/page-header';
import { useToast } from '@/components/ui/toast';
import { getGrowersQueryOptions } from '@/features/growers/api/get-growers';
import { getSiteQueryOptions } from '@/features/sites/api/get-site';
import { SiteForm } from '@/features/sites/components/site-form';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    await Promise.all([
      queryClient.ensureQueryData(getSiteQueryOptions(params.siteId!)),
      queryClient.ensureQueryData(getGrowersQueryOptions()),
    ]);
    return null;
  };

/** /sites/:siteId/edit */
export function SiteEditRoute() {
  const id = useParams().siteId!;
  const navigate = useNavigate();
  const toast = useToast();
  const { data: site, refetch } = useSuspenseQuery(getSiteQueryOptions(id));
  const { data: growers } = useSuspenseQuery(getGrowersQueryOptions());
  return (
    <>
      <PageHeader
        title={`Edit ${site.name}`}
        back={<Link to={paths.site(id)}>← Back to the site</Link>}
      />
      <SiteForm
        site={site}
        growers={growers.items}
        onReload={refetch}
        onCancel={() => navigate(paths.site(id))}
        onSaved={(saved) => {
          toast.show(`${saved.name} saved.`);
          navigate(paths.site(id));
        }}
      />
    </>
  );
}

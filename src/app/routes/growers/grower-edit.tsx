import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PageHeader } from '@/components/ui/page-header';
import { useToast } from '@/components/ui/toast';
import { getGrowerQueryOptions } from '@/features/growers/api/get-grower';
import { GrowerForm } from '@/features/growers/components/grower-form';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    await queryClient.ensureQueryData(getGrowerQueryOptions(params.growerId!));
    return null;
  };

/** /growers/:growerId/edit */
export function GrowerEditRoute() {
  const id = useParams().growerId!;
  const navigate = useNavigate();
  const toast = useToast();
  const { data: grower, refetch } = useSuspenseQuery(getGrowerQueryOptions(id));
  return (
    <>
      <PageHeader
        title={`Edit ${grower.name}`}
        back={<Link to={paths.grower(id)}>← Back to the grower</Link>}
      />
      <GrowerForm
        grower={grower}
        onReload={refetch}
        onCancel={() => navigate(paths.grower(id))}
        onSaved={(saved) => {
          toast.show(`${saved.name} saved.`);
          navigate(paths.grower(id));
        }}
      />
    </>
  );
}

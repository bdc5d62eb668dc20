import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PageHeader } from '@/components/ui/page-header';
import { useToast } from '@/components/ui/toast';
import { getYardQueryOptions } from '@/features/yards/api/get-yard';
import { YardForm } from '@/features/yards/components/yard-form';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    await queryClient.ensureQueryData(getYardQueryOptions(params.yardId!));
    return null;
  };

/** /yards/:yardId/edit */
export function YardEditRoute() {
  const id = useParams().yardId!;
  const navigate = useNavigate();
  const toast = useToast();
  const { data: yard, refetch } = useSuspenseQuery(getYardQueryOptions(id));
  return (
    <>
      <PageHeader
        title={`Edit ${yard.name}`}
        back={<Link to={paths.yard(id)}>← Back to the yard</Link>}
      />
      <YardForm
        yard={yard}
        onReload={refetch}
        onCancel={() => navigate(paths.yard(id))}
        onSaved={(saved) => {
          toast.show(`${saved.name} saved.`);
          navigate(paths.yard(saved.id));
        }}
      />
    </>
  );
}

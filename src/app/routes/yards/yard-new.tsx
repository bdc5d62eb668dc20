import type { QueryClient } from '@tanstack/react-query';
import { Link, useNavigate, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PageHeader } from '@/components/ui/page-header';
import { useToast } from '@/components/ui/toast';
import { YardForm } from '@/features/yards/components/yard-form';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    return null;
  };

/** /yards/new */
export function YardNewRoute() {
  const navigate = useNavigate();
  const toast = useToast();
  return (
    <>
      <PageHeader title="Add a yard" back={<Link to={paths.yards}>← All yards</Link>} />
      <YardForm
        onCancel={() => navigate(paths.yards)}
        onSaved={(yard) => {
          toast.show(`${yard.name} added.`);
          navigate(paths.yard(yard.id));
        }}
      />
    </>
  );
}

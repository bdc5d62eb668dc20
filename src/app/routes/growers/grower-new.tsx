import type { QueryClient } from '@tanstack/react-query';
import { Link, useNavigate, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PageHeader } from '@/components/ui/page-header';
import { useToast } from '@/components/ui/toast';
import { GrowerForm } from '@/features/growers/components/grower-form';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    return null;
  };

/** /growers/new */
export function GrowerNewRoute() {
  const navigate = useNavigate();
  const toast = useToast();
  return (
    <>
      <PageHeader title="Add a grower" back={<Link to={paths.growers}>← All growers</Link>} />
      <GrowerForm
        onCancel={() => navigate(paths.growers)}
        onSaved={(grower) => {
          toast.show(`${grower.name} added.`);
          navigate(paths.grower(grower.id));
        }}
      />
    </>
  );
}

import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PageHeader } from '@/components/ui/page-header';
import { useToast } from '@/components/ui/toast';
import { getMoveQueryOptions } from '@/features/moves/api/get-move';
import { MovePlanner } from '@/features/moves/components/move-planner';
import { useUser } from '@/lib/auth';
import { requireRole } from '@/lib/route-guards';
import { ensurePlannerData, usePlannerChoices } from './planner-data';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    await Promise.all([
      ensurePlannerData(queryClient),
      queryClient.ensureQueryData(getMoveQueryOptions(params.moveId!)),
    ]);
    return null;
  };

/** /moves/:moveId/edit: the planner over a saved move, saved with its version. */
export function MoveEditRoute() {
  const id = useParams().moveId!;
  const user = useUser();
  const choices = usePlannerChoices();
  const navigate = useNavigate();
  const toast = useToast();
  const { data: move, refetch } = useSuspenseQuery(getMoveQueryOptions(id));
  return (
    <>
      <PageHeader
        title={`Edit ${move.name}`}
        back={<Link to={paths.move(id)}>← Back to the move</Link>}
      />
      <MovePlanner
        key={move.id}
        move={move}
        choices={choices}
        units={user.units}
        defaultNight={move.nightOf}
        onReload={async () => (await refetch()).data?.version}
        onCancel={() => navigate(paths.move(id))}
        onSaved={(saved) => {
          toast.show(`${saved.name} saved.`);
          navigate(paths.move(id));
        }}
      />
    </>
  );
}

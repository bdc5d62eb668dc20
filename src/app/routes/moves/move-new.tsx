import type { QueryClient } from '@tanstack/react-query';
import { Link, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PageHeader } from '@/components/ui/page-header';
import { useToast } from '@/components/ui/toast';
import { MovePlanner } from '@/features/moves/components/move-planner';
import { useUser } from '@/lib/auth';
import { requireRole } from '@/lib/route-guards';
import { todayIso } from '@/lib/units';
import { ensurePlannerData, usePlannerChoices } from './planner-data';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    await ensurePlannerData(queryClient);
    return null;
  };

/** /moves/new (?night=YYYY-MM-DD&to=siteId): plan a night's move. */
export function MoveNewRoute() {
  const user = useUser();
  const choices = usePlannerChoices();
  const navigate = useNavigate();
  const toast = useToast();
  const [params] = useSearchParams();
  return (
    <>
      <PageHeader
        title="Plan a move"
        back={<Link to={paths.moves}>← All moves</Link>}
        description="The load sheet, the timeline and the warnings follow your choices as you make them."
      />
      <MovePlanner
        choices={choices}
        units={user.units}
        defaultNight={params.get('night') ?? todayIso()}
        defaultDestinationSiteId={params.get('to')}
        onCancel={() => navigate(paths.moves)}
        onSaved={(move) => {
          toast.show(`${move.name} saved as a draft.`);
          navigate(paths.move(move.id));
        }}
      />
    </>
  );
}

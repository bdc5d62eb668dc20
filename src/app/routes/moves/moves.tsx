import type { QueryClient } from '@tanstack/react-query';
import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { ButtonLink } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { PageHeader } from '@/components/ui/page-header';
import { getMovesQueryOptions } from '@/features/moves/api/get-moves';
import { MovesList } from '@/features/moves/components/moves-list';
import { getSitesQueryOptions } from '@/features/sites/api/get-sites';
import { getYardsQueryOptions } from '@/features/yards/api/get-yards';
import { canPlan, useUser } from '@/lib/auth';
import { requireRole } from '@/lib/route-guards';
import { todayIso } from '@/lib/units';

/** From a week ago on, so last night's haul is still listed. */
const defaultFrom = () => {
  const d = new Date(`${todayIso()}T12:00:00Z`);
  d.setUTCDate(d.getUTCDate() - 7);
  return d.toISOString().slice(0, 10);
};
const filtersOf = (search: URLSearchParams) => ({ from: search.get('from') ?? defaultFrom() });

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner', 'crew']);
    const filters = filtersOf(new URL(request.url).searchParams);
    await queryClient.ensureQueryData(getMovesQueryOptions(filters));
    void queryClient.prefetchQuery(getSitesQueryOptions());
    void queryClient.prefetchQuery(getYardsQueryOptions());
    return null;
  };

/** /moves: moves by night with their status; planners start new ones here. */
export function MovesRoute() {
  const user = useUser();
  const [search, setSearch] = useSearchParams();
  const filters = filtersOf(search);
  const { data } = useSuspenseQuery(getMovesQueryOptions(filters));
  const sites = useQuery(getSitesQueryOptions());
  const yards = useQuery(getYardsQueryOptions());
  const placeNames: Record<string, string> = Object.fromEntries([
    ...(sites.data?.items ?? []).map((s) => [s.id, s.name]),
    ...(yards.data?.items ?? []).map((y) => [y.id, y.name]),
  ]);
  return (
    <>
      <PageHeader
        title="Moves"
        description="Each night's hauls, from draft to placed."
        actions={canPlan(user) && <ButtonLink to={paths.moveNew}>Plan a move</ButtonLink>}
      />
      <div className="mb-4 max-w-xs">
        <Field label="Nights from">
          <Input
            type="date"
            value={filters.from}
            onChange={(e) => e.target.value && setSearch({ from: e.target.value })}
          />
        </Field>
      </div>
      <MovesList moves={data.items} placeNames={placeNames} linkTo={paths.move} />
    </>
  );
}

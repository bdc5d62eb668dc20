import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { PageHeader, Section } from '@/components/ui/page-header';
import { getSeasonQueryOptions } from '@/features/season/api/get-season';
import { SeasonGrid } from '@/features/season/components/season-grid';
import { SupplyChart } from '@/features/season/components/supply-chart';
import { requireRole } from '@/lib/route-guards';
import { todayIso } from '@/lib/units';

const shift = (date: string, days: number) => {
  const d = new Date(`${date}T12:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
};

/** Default: four weeks back to about six months ahead (an almond season from December). */
const periodOf = (search: URLSearchParams) => {
  const from = search.get('from') ?? shift(todayIso(), -28);
  return { from, to: search.get('to') ?? shift(from, 26 * 7) };
};

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner', 'crew']);
    const { from, to } = periodOf(new URL(request.url).searchParams);
    await queryClient.ensureQueryData(getSeasonQueryOptions(from, to));
    return null;
  };

/** /season: contracts and moves by ISO week, and colonies needed against colonies available. */
export function SeasonRoute() {
  const [search, setSearch] = useSearchParams();
  const { from, to } = periodOf(search);
  const { data: board } = useSuspenseQuery(getSeasonQueryOptions(from, to));
  return (
    <>
      <PageHeader
        title="Season"
        description="Contracts and moves week by week, and whether the colonies go round."
      />
      <div className="mb-4 flex flex-wrap gap-3">
        <Field label="From">
          <Input
            type="date"
            value={from}
            onChange={(e) => e.target.value && setSearch({ from: e.target.value, to })}
          />
        </Field>
        <Field label="To">
          <Input
            type="date"
            value={to}
            onChange={(e) => e.target.value && setSearch({ from, to: e.target.value })}
          />
        </Field>
      </div>
      <div className="flex flex-col gap-6">
        <Section title="Colonies needed and available">
          <SupplyChart board={board} />
          <ul className="mt-2 list-disc pl-5 text-sm text-dusk-300">
            {board.notes.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        </Section>
        <Section title="Board">
          <SeasonGrid board={board} contractLink={paths.contract} moveLink={paths.move} />
        </Section>
      </div>
    </>
  );
}

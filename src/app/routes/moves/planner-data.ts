import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { getContractsQueryOptions } from '@/features/contracts/api/get-contracts';
import { getGrowersQueryOptions } from '@/features/growers/api/get-growers';
import type { PlannerChoices } from '@/features/moves/components/planner-choices';
import { getTrucksQueryOptions } from '@/features/settings/api/get-trucks';
import { getSitesQueryOptions } from '@/features/sites/api/get-sites';
import { getYardsQueryOptions } from '@/features/yards/api/get-yards';

/** The lists the planner chooses from, composed here because features do not import each other. */
export const plannerQueries = () => [
  getSitesQueryOptions(),
  getYardsQueryOptions(),
  getGrowersQueryOptions(),
  getContractsQueryOptions(),
  getTrucksQueryOptions(),
];

export const ensurePlannerData = (queryClient: QueryClient) =>
  Promise.all(plannerQueries().map((q) => queryClient.ensureQueryData(q as never)));

const open = <T extends { archivedAt: string | null }>(items: T[]) =>
  items.filter((item) => !item.archivedAt);

/** The planner's choices from the cache its loader filled. */
export function usePlannerChoices(): PlannerChoices {
  const { data: sites } = useSuspenseQuery(getSitesQueryOptions());
  const { data: yards } = useSuspenseQuery(getYardsQueryOptions());
  const { data: growers } = useSuspenseQuery(getGrowersQueryOptions());
  const { data: contracts } = useSuspenseQuery(getContractsQueryOptions());
  const { data: trucks } = useSuspenseQuery(getTrucksQueryOptions());
  return {
    sites: open(sites.items),
    yards: open(yards.items),
    growers: growers.items,
    contracts: open(contracts.items).filter(
      (c) => !['turned-down', 'withdrawn', 'settled'].includes(c.status),
    ),
    trucks: open(trucks.items),
  };
}

/** What the planner chooses from; the route reads them from other features and passes them in. */
export interface PlannerChoices {
  sites: Array<{ id: string; name: string; growerId: string | null; crop: string }>;
  yards: Array<{ id: string; name: string }>;
  growers: Array<{ id: string; name: string }>;
  contracts: Array<{
    id: string;
    growerId: string;
    siteIds: string[];
    crop: string;
    season: number;
    status: string;
    coloniesOrdered: number;
  }>;
  trucks: Array<{
    id: string;
    name: string;
    payloadKg: number;
    palletSpots: number;
    tiers: number;
  }>;
}

import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { atlasKeys } from './keys';
import type { AtlasSummary } from './types';

/** GET /api/atlas?on=…: yards, sites, drops, moves and spray notices on a date. */
export const getAtlas = (on: string) => api.get<AtlasSummary>('/api/atlas', { query: { on } });

export const getAtlasQueryOptions = (on: string) =>
  queryOptions({ queryKey: atlasKeys.summary(on), queryFn: () => getAtlas(on), staleTime: 60_000 });

/** The summary for a date; while another date loads, the previous one stays on the map. */
export function useAtlas(on: string) {
  return useQuery({ ...getAtlasQueryOptions(on), placeholderData: keepPreviousData });
}

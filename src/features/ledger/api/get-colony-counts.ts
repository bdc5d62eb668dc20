import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ColonyCount, PlaceKind } from '@shared/schemas/ledger';
import { api } from '@/lib/api-client';
import { ledgerKeys } from './keys';

interface CountsFilters {
  placeKind?: PlaceKind;
  placeId?: string;
  on?: string;
}

/** Colonies by lot at a place (today unless `on` is given), summed from the ledger. */
export const getColonyCounts = (filters: CountsFilters) =>
  api.get<{ items: ColonyCount[] }>('/api/ledger/counts', { query: { ...filters } });

export const getColonyCountsQueryOptions = (filters: CountsFilters) =>
  queryOptions({ queryKey: ledgerKeys.counts(filters), queryFn: () => getColonyCounts(filters) });

export const useColonyCounts = (filters: CountsFilters) =>
  useQuery(getColonyCountsQueryOptions(filters));

import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Receivables, ReceivablesQuery } from '../types';

/** Query keys of receivables: ['receivables', query]. */
export const receivablesKeys = {
  all: ['receivables'] as const,
  view: (query: ReceivablesQuery) => [...receivablesKeys.all, query] as const,
};

export const getReceivables = (query: ReceivablesQuery) =>
  api.get<Receivables>('/api/receivables', { query: { ...query } });

export const getReceivablesQueryOptions = (query: ReceivablesQuery = {}) =>
  queryOptions({ queryKey: receivablesKeys.view(query), queryFn: () => getReceivables(query) });

export const useReceivables = (query: ReceivablesQuery = {}) =>
  useQuery(getReceivablesQueryOptions(query));

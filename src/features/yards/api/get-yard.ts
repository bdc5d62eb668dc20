import { queryOptions, useQuery } from '@tanstack/react-query';
import type { YardView } from '@shared/schemas/yards';
import { api } from '@/lib/api-client';
import { yardKeys } from './keys';

export const getYard = (id: string) => api.get<YardView>(`/api/yards/${encodeURIComponent(id)}`);

export const getYardQueryOptions = (id: string) =>
  queryOptions({ queryKey: yardKeys.detail(id), queryFn: () => getYard(id) });

export const useYard = (id: string) => useQuery(getYardQueryOptions(id));

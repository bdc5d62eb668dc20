import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Grower } from '../types';
import { growerKeys } from './keys';

export const getGrower = (id: string) => api.get<Grower>(`/api/growers/${encodeURIComponent(id)}`);

export const getGrowerQueryOptions = (id: string) =>
  queryOptions({ queryKey: growerKeys.detail(id), queryFn: () => getGrower(id) });

export const useGrower = (id: string) => useQuery(getGrowerQueryOptions(id));

import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Move } from '../types';
import { moveKeys } from './keys';

export const getMove = (id: string) => api.get<Move>(`/api/moves/${encodeURIComponent(id)}`);

export const getMoveQueryOptions = (id: string) =>
  queryOptions({ queryKey: moveKeys.detail(id), queryFn: () => getMove(id) });

export const useMove = (id: string) => useQuery(getMoveQueryOptions(id));

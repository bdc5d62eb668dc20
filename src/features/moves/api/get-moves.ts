import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import type { Move } from '../types';
import { moveKeys, type MoveListFilters } from './keys';

/** Moves matching the filters, up to 500 (a season's worth). */
export const getMoves = (filters: MoveListFilters) =>
  api.get<ListResult<Move>>('/api/moves', { query: { limit: 500, ...filters } });

export const getMovesQueryOptions = (filters: MoveListFilters = {}) =>
  queryOptions({ queryKey: moveKeys.list(filters), queryFn: () => getMoves(filters) });

export const useMoves = (filters: MoveListFilters = {}) => useQuery(getMovesQueryOptions(filters));

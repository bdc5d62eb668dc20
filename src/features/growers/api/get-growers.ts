import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import type { Grower } from '../types';
import { growerKeys } from './keys';

/** Every grower of the operation (a grower user gets only their own). */
export const getGrowers = () =>
  api.get<ListResult<Grower>>('/api/growers', { query: { limit: 500 } });

export const getGrowersQueryOptions = () =>
  queryOptions({ queryKey: growerKeys.list(), queryFn: getGrowers });

export const useGrowers = () => useQuery(getGrowersQueryOptions());

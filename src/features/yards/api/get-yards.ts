import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import type { YardView } from '@shared/schemas/yards';
import { api } from '@/lib/api-client';
import { yardKeys } from './keys';

/** Up to 500 yards (an operation's whole list), for sorting and filtering in the browser. */
export const getYards = () =>
  api.get<ListResult<YardView>>('/api/yards', { query: { limit: 500 } });

export const getYardsQueryOptions = () =>
  queryOptions({ queryKey: yardKeys.list(), queryFn: getYards });

export const useYards = () => useQuery(getYardsQueryOptions());

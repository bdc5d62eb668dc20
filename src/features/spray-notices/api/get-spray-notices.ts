import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { SprayNoticeFilters, SprayNoticeList } from '../types';
import { sprayNoticeKeys } from './keys';

/** Spray notices (a grower gets only their own), newest first, up to 200. */
export const getSprayNotices = (filters: SprayNoticeFilters) =>
  api.get<SprayNoticeList>('/api/spray-notices', { query: { limit: 200, ...filters } });

export const getSprayNoticesQueryOptions = (filters: SprayNoticeFilters = {}) =>
  queryOptions({
    queryKey: sprayNoticeKeys.list(filters),
    queryFn: () => getSprayNotices(filters),
  });

export const useSprayNotices = (filters: SprayNoticeFilters = {}) =>
  useQuery(getSprayNoticesQueryOptions(filters));

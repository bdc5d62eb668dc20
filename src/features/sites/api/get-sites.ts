import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import type { Site } from '../types';
import { siteKeys } from './keys';

/** Sites (a grower gets only their own), up to 500. */
export const getSites = (filters: { growerId?: string } = {}) =>
  api.get<ListResult<Site>>('/api/sites', { query: { limit: 500, ...filters } });

export const getSitesQueryOptions = (filters: { growerId?: string } = {}) =>
  queryOptions({ queryKey: siteKeys.list(filters), queryFn: () => getSites(filters) });

export const useSites = (filters: { growerId?: string } = {}) =>
  useQuery(getSitesQueryOptions(filters));

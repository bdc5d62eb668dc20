import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Site } from '../types';
import { siteKeys } from './keys';

export const getSite = (id: string) => api.get<Site>(`/api/sites/${encodeURIComponent(id)}`);

export const getSiteQueryOptions = (id: string) =>
  queryOptions({ queryKey: siteKeys.detail(id), queryFn: () => getSite(id) });

export const useSite = (id: string) => useQuery(getSiteQueryOptions(id));

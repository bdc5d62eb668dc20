import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, ApiError } from '@/lib/api-client';
import type { CropRate } from '../types';
import { settingsKeys } from './keys';

/** The crops with their default stocking rates, or null while the API does not offer them. */
export async function getCrops(): Promise<CropRate[] | null> {
  try {
    const body = await api.get<CropRate[] | { items: CropRate[] }>('/api/crops');
    return Array.isArray(body) ? body : body.items;
  } catch (error) {
    if (error instanceof ApiError && error.status === 404) return null;
    throw error;
  }
}

export const getCropsQueryOptions = () =>
  queryOptions({ queryKey: settingsKeys.crops, queryFn: getCrops, staleTime: 60 * 60_000 });

export const useCrops = () => useQuery(getCropsQueryOptions());

import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import type { Truck } from '../types';
import { settingsKeys } from './keys';

export const getTrucks = () => api.get<ListResult<Truck>>('/api/trucks', { query: { limit: 500 } });

export const getTrucksQueryOptions = () =>
  queryOptions({ queryKey: settingsKeys.truckList(), queryFn: getTrucks });

export const useTrucks = () => useQuery(getTrucksQueryOptions());

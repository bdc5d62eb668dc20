import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import type { WeightSample, WeightSampleFilters } from '../types';
import { sampleKeys } from './keys';

/** Scale readings at a yard, for a lot or a move, newest first. */
export const getWeightSamples = (filters: WeightSampleFilters) =>
  api.get<ListResult<WeightSample>>('/api/weight-samples', { query: { limit: 50, ...filters } });

export const getWeightSamplesQueryOptions = (filters: WeightSampleFilters) =>
  queryOptions({
    queryKey: sampleKeys.weights(filters),
    queryFn: () => getWeightSamples(filters),
  });

export const useWeightSamples = (filters: WeightSampleFilters) =>
  useQuery(getWeightSamplesQueryOptions(filters));

import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import type { StrengthSample, StrengthSampleFilters } from '../types';
import { sampleKeys } from './keys';

/** Strength inspections at a place or of a lot, newest first, summarised against `minimumFrames`. */
export const getStrengthSamples = (filters: StrengthSampleFilters) =>
  api.get<ListResult<StrengthSample>>('/api/strength-samples', {
    query: { limit: 50, ...filters },
  });

export const getStrengthSamplesQueryOptions = (filters: StrengthSampleFilters) =>
  queryOptions({
    queryKey: sampleKeys.strength(filters),
    queryFn: () => getStrengthSamples(filters),
  });

export const useStrengthSamples = (filters: StrengthSampleFilters) =>
  useQuery(getStrengthSamplesQueryOptions(filters));

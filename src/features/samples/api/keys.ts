import type { StrengthSampleFilters, WeightSampleFilters } from '../types';

/** Query keys of samples: ['samples','weights',filters] and ['samples','strength',filters]. */
export const sampleKeys = {
  all: ['samples'] as const,
  weights: (filters: WeightSampleFilters) => [...sampleKeys.all, 'weights', filters] as const,
  strength: (filters: StrengthSampleFilters) => [...sampleKeys.all, 'strength', filters] as const,
};

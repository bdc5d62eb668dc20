import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { WeightSampleCreateRequest } from '@shared/schemas/samples';
import { api } from '@/lib/api-client';
import type { WeightSample } from '../types';
import { sampleKeys } from './keys';

export const createWeightSample = (input: WeightSampleCreateRequest) =>
  api.post<WeightSample>('/api/weight-samples', input);

/** Records hive weights read off a scale; every samples list refreshes after. */
export function useCreateWeightSample() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createWeightSample,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sampleKeys.all }),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { StrengthSampleCreateRequest } from '@shared/schemas/samples';
import { api } from '@/lib/api-client';
import type { StrengthSample } from '../types';
import { sampleKeys } from './keys';

export const createStrengthSample = (input: StrengthSampleCreateRequest) =>
  api.post<StrengthSample>('/api/strength-samples', input);

/** Records a strength inspection; every samples list refreshes after. */
export function useCreateStrengthSample() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createStrengthSample,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sampleKeys.all }),
  });
}

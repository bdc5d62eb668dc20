import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { GrowerCreateRequest } from '@shared/schemas/growers';
import { api } from '@/lib/api-client';
import type { Grower } from '../types';
import { growerKeys } from './keys';

export const createGrower = (input: GrowerCreateRequest) => api.post<Grower>('/api/growers', input);

export function useCreateGrower() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createGrower,
    onSuccess: (grower) => {
      queryClient.setQueryData(growerKeys.detail(grower.id), grower);
      return queryClient.invalidateQueries({ queryKey: growerKeys.lists() });
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { YardCreateRequest, YardView } from '@shared/schemas/yards';
import { api } from '@/lib/api-client';
import { yardKeys } from './keys';

export const createYard = (input: YardCreateRequest) => api.post<YardView>('/api/yards', input);

export function useCreateYard() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createYard,
    onSuccess: (yard) => {
      queryClient.setQueryData(yardKeys.detail(yard.id), yard);
      return queryClient.invalidateQueries({ queryKey: yardKeys.lists() });
    },
  });
}

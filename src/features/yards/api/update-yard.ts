import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { YardCreateRequest, YardView } from '@shared/schemas/yards';
import { api } from '@/lib/api-client';
import { yardKeys } from './keys';

export interface UpdateYardInput {
  id: string;
  version: number;
  changes: Partial<YardCreateRequest>;
}

export const updateYard = ({ id, version, changes }: UpdateYardInput) =>
  api.patch<YardView>(`/api/yards/${encodeURIComponent(id)}`, { ...changes, version });

export function useUpdateYard() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateYard,
    onSuccess: (yard) => {
      queryClient.setQueryData(yardKeys.detail(yard.id), yard);
      return queryClient.invalidateQueries({ queryKey: yardKeys.lists() });
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { GrowerCreateRequest } from '@shared/schemas/growers';
import { api } from '@/lib/api-client';
import type { Grower } from '../types';
import { growerKeys } from './keys';

export interface UpdateGrowerInput {
  id: string;
  version: number;
  changes: Partial<GrowerCreateRequest>;
}

/** Saves a grower; the contacts sent replace the old list. */
export const updateGrower = ({ id, version, changes }: UpdateGrowerInput) =>
  api.patch<Grower>(`/api/growers/${encodeURIComponent(id)}`, { ...changes, version });

export function useUpdateGrower() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateGrower,
    onSuccess: (grower) => {
      queryClient.setQueryData(growerKeys.detail(grower.id), grower);
      return queryClient.invalidateQueries({ queryKey: growerKeys.lists() });
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MoveCreateRequest } from '@shared/schemas/moves';
import { api } from '@/lib/api-client';
import type { Move } from '../types';
import { moveKeys } from './keys';

export interface UpdateMoveInput {
  id: string;
  version: number;
  changes: Partial<MoveCreateRequest>;
}

/** Saves changes at `version`; a stale version is a 409 the form explains. */
export const updateMove = ({ id, version, changes }: UpdateMoveInput) =>
  api.patch<Move>(`/api/moves/${encodeURIComponent(id)}`, { ...changes, version });

export function useUpdateMove() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMove,
    onSuccess: (move) => {
      queryClient.setQueryData(moveKeys.detail(move.id), move);
      return queryClient.invalidateQueries({ queryKey: moveKeys.all });
    },
  });
}

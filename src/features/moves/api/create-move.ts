import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MoveCreateRequest } from '@shared/schemas/moves';
import { api } from '@/lib/api-client';
import type { Move } from '../types';
import { moveKeys } from './keys';

/** Saves a new move as a draft; the server computes and stores its plan. */
export const createMove = (input: MoveCreateRequest) => api.post<Move>('/api/moves', input);

export function useCreateMove() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createMove,
    onSuccess: (move) => {
      queryClient.setQueryData(moveKeys.detail(move.id), move);
      return queryClient.invalidateQueries({ queryKey: moveKeys.all });
    },
  });
}

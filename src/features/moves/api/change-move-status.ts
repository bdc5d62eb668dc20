import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MoveStatus } from '@shared/schemas/moves';
import { api } from '@/lib/api-client';
import type { Move } from '../types';
import { moveKeys } from './keys';

export interface ChangeMoveStatusInput {
  id: string;
  version: number;
  status: MoveStatus;
}

/** Moves a move along its life (placing writes the ledger on the server). */
export const changeMoveStatus = ({ id, version, status }: ChangeMoveStatusInput) =>
  api.post<Move>(`/api/moves/${encodeURIComponent(id)}/status`, { version, status });

export function useChangeMoveStatus() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changeMoveStatus,
    onSuccess: (move) => {
      queryClient.setQueryData(moveKeys.detail(move.id), move);
      return queryClient.invalidateQueries({ queryKey: moveKeys.all });
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Grower } from '../types';
import { growerKeys } from './keys';

export const archiveGrower = ({ id, version }: { id: string; version: number }) =>
  api.post<Grower>(`/api/growers/${encodeURIComponent(id)}/archive`, { version });

export function useArchiveGrower() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: archiveGrower,
    onSettled: () => queryClient.invalidateQueries({ queryKey: growerKeys.all }),
  });
}

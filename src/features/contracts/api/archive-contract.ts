import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Contract } from '../types';
import { contractKeys } from './keys';

export const archiveContract = ({ id, version }: { id: string; version: number }) =>
  api.post<Contract>(`/api/contracts/${encodeURIComponent(id)}/archive`, { version });

export function useArchiveContract() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: archiveContract,
    onSettled: () => queryClient.invalidateQueries({ queryKey: contractKeys.all }),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ContractCreateRequest } from '@shared/schemas/contracts';
import { api } from '@/lib/api-client';
import type { Contract } from '../types';
import { contractKeys } from './keys';

export interface UpdateContractInput {
  id: string;
  version: number;
  changes: Partial<ContractCreateRequest>;
}

export const updateContract = ({ id, version, changes }: UpdateContractInput) =>
  api.patch<Contract>(`/api/contracts/${encodeURIComponent(id)}`, { ...changes, version });

export function useUpdateContract() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateContract,
    onSuccess: (contract) => {
      queryClient.setQueryData(contractKeys.detail(contract.id), contract);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: contractKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: contractKeys.history(contract.id) }),
      ]);
    },
  });
}

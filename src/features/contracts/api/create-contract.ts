import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ContractCreateRequest } from '@shared/schemas/contracts';
import { api } from '@/lib/api-client';
import type { Contract } from '../types';
import { contractKeys } from './keys';

export const createContract = (input: ContractCreateRequest) =>
  api.post<Contract>('/api/contracts', input);

export function useCreateContract() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createContract,
    onSuccess: (contract) => {
      queryClient.setQueryData(contractKeys.detail(contract.id), contract);
      return queryClient.invalidateQueries({ queryKey: contractKeys.lists() });
    },
  });
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Contract } from '../types';
import { contractKeys } from './keys';

export const getContract = (id: string) =>
  api.get<Contract>(`/api/contracts/${encodeURIComponent(id)}`);

export const getContractQueryOptions = (id: string) =>
  queryOptions({ queryKey: contractKeys.detail(id), queryFn: () => getContract(id) });

export const useContract = (id: string) => useQuery(getContractQueryOptions(id));

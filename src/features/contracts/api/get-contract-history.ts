import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ContractEvent } from '../types';
import { contractKeys } from './keys';

/** What happened to a contract, oldest first (owners, planners and the grower may read it). */
export const getContractHistory = (id: string) =>
  api.get<{ items: ContractEvent[] }>(`/api/contracts/${encodeURIComponent(id)}/history`);

export const getContractHistoryQueryOptions = (id: string) =>
  queryOptions({ queryKey: contractKeys.history(id), queryFn: () => getContractHistory(id) });

export const useContractHistory = (id: string, enabled = true) =>
  useQuery({ ...getContractHistoryQueryOptions(id), enabled });

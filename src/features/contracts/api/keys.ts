import type { ContractFilters } from '../types';

/** Query keys of contracts: ['contracts','list',filters], ['contracts','detail',id], history. */
export const contractKeys = {
  all: ['contracts'] as const,
  lists: () => [...contractKeys.all, 'list'] as const,
  list: (filters: ContractFilters) => [...contractKeys.lists(), filters] as const,
  details: () => [...contractKeys.all, 'detail'] as const,
  detail: (id: string) => [...contractKeys.details(), id] as const,
  history: (id: string) => [...contractKeys.detail(id), 'history'] as const,
};

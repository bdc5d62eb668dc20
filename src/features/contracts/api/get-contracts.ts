import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import type { Contract, ContractFilters } from '../types';
import { contractKeys } from './keys';

/** Contracts matching the filters (a grower gets only their own), up to 500. */
export const getContracts = (filters: ContractFilters) =>
  api.get<ListResult<Contract>>('/api/contracts', { query: { limit: 500, ...filters } });

export const getContractsQueryOptions = (filters: ContractFilters = {}) =>
  queryOptions({ queryKey: contractKeys.list(filters), queryFn: () => getContracts(filters) });

export const useContracts = (filters: ContractFilters = {}) =>
  useQuery(getContractsQueryOptions(filters));

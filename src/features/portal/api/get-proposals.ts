import { queryOptions } from '@tanstack/react-query';
import type { ProposalStatus } from '@shared/schemas/proposals';
import { api } from '@/lib/api-client';
import type { Proposal } from '../types';
import { portalKeys } from './keys';

/** Proposals of the grower's own contracts, newest first. */
export const getProposals = (filters: { status?: ProposalStatus }) =>
  api.get<{ items: Proposal[]; total: number }>('/api/proposals', { query: filters });

export const getProposalsQueryOptions = (filters: { status?: ProposalStatus } = {}) =>
  queryOptions({ queryKey: portalKeys.proposals(filters), queryFn: () => getProposals(filters) });

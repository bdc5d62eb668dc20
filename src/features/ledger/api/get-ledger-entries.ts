import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import type { LedgerKind, PlaceKind } from '@shared/schemas/ledger';
import { api } from '@/lib/api-client';
import { ledgerKeys, type LedgerFilters } from './keys';

/** A ledger entry as the API presents it. */
export interface LedgerEntry {
  id: string;
  lotId: string;
  kind: LedgerKind;
  occurredOn: string;
  colonies: number;
  from: { kind: PlaceKind; id: string } | null;
  to: { kind: PlaceKind; id: string } | null;
  reason: string;
  moveId: string | null;
  recordedBy: string | null;
  createdAt: string;
}

/** Ledger entries touching a place or lot, newest first. */
export const getLedgerEntries = (filters: LedgerFilters) =>
  api.get<ListResult<LedgerEntry>>('/api/ledger', { query: { limit: 100, ...filters } });

export const getLedgerEntriesQueryOptions = (filters: LedgerFilters) =>
  queryOptions({ queryKey: ledgerKeys.list(filters), queryFn: () => getLedgerEntries(filters) });

export const useLedgerEntries = (filters: LedgerFilters) =>
  useQuery(getLedgerEntriesQueryOptions(filters));

import type { PlaceKind } from '@shared/schemas/ledger';

export interface LedgerFilters {
  placeKind?: PlaceKind;
  placeId?: string;
  lotId?: string;
  limit?: number;
}

/** Query keys of the colony ledger: entries and counts by place. */
export const ledgerKeys = {
  all: ['ledger'] as const,
  lists: () => [...ledgerKeys.all, 'list'] as const,
  list: (filters: LedgerFilters) => [...ledgerKeys.lists(), filters] as const,
  counts: (filters: { placeKind?: PlaceKind; placeId?: string; on?: string }) =>
    [...ledgerKeys.all, 'counts', filters] as const,
};

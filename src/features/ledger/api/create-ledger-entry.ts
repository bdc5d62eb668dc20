import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LedgerEntryCreateRequest } from '@shared/schemas/ledger';
import { api } from '@/lib/api-client';
import type { LedgerEntry } from './get-ledger-entries';
import { ledgerKeys } from './keys';

export const createLedgerEntry = (input: LedgerEntryCreateRequest) =>
  api.post<LedgerEntry>('/api/ledger', input);

/** Records an entry; counts everywhere are summed from the ledger, so they refresh after. */
export function useCreateLedgerEntry() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createLedgerEntry,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ledgerKeys.all }),
        // Yards and sites present their colonies from the ledger too.
        queryClient.invalidateQueries({ queryKey: ['yards'] }),
        queryClient.invalidateQueries({ queryKey: ['sites'] }),
      ]),
  });
}

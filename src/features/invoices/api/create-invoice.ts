import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InvoiceCreateRequest } from '@shared/schemas/invoices';
import { api } from '@/lib/api-client';
import type { Invoice } from '../types';
import { invoiceKeys } from './keys';

/** Bills a contract: the server computes the lines from the contract and the ledger. */
export const createInvoice = (input: InvoiceCreateRequest) =>
  api.post<Invoice>('/api/invoices', input);

export function useCreateInvoice() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvoice,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invoiceKeys.lists() }),
  });
}

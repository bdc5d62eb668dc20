import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Invoice } from '../types';
import { invoiceKeys } from './keys';

export interface IssueInvoiceInput {
  id: string;
  version: number;
  /** Net 30 from today when left out. */
  dueOn?: string;
}

/** draft → sent: dated, due, e-mailed to the grower. */
export const issueInvoice = ({ id, ...body }: IssueInvoiceInput) =>
  api.post<Invoice>(`/api/invoices/${encodeURIComponent(id)}/issue`, body);

/** Cancels an invoice that has received nothing; it keeps its number. */
export const voidInvoice = ({ id, version }: { id: string; version: number }) =>
  api.post<Invoice>(`/api/invoices/${encodeURIComponent(id)}/void`, { version });

function useInvoiceChange<T extends { id: string }>(change: (input: T) => Promise<Invoice>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: change,
    onSettled: () => queryClient.invalidateQueries({ queryKey: invoiceKeys.all }),
  });
}

export const useIssueInvoice = () => useInvoiceChange(issueInvoice);
export const useVoidInvoice = () => useInvoiceChange(voidInvoice);

import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import type { Invoice, InvoiceFilters } from '../types';
import { invoiceKeys } from './keys';

/** Invoices matching the filters, newest number first (a grower gets only their own). */
export const getInvoices = (filters: InvoiceFilters) =>
  api.get<ListResult<Invoice>>('/api/invoices', { query: { limit: 500, ...filters } });

export const getInvoicesQueryOptions = (filters: InvoiceFilters = {}) =>
  queryOptions({ queryKey: invoiceKeys.list(filters), queryFn: () => getInvoices(filters) });

export const useInvoices = (filters: InvoiceFilters = {}) =>
  useQuery(getInvoicesQueryOptions(filters));

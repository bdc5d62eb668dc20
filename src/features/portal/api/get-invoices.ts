import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PortalInvoice } from '../types';
import { portalKeys } from './keys';

/** The grower's own invoices. */
export const getPortalInvoices = () =>
  api.get<{ items: PortalInvoice[]; total: number }>('/api/invoices', { query: { limit: 200 } });

export const getPortalInvoicesQueryOptions = () =>
  queryOptions({ queryKey: portalKeys.invoices(), queryFn: getPortalInvoices });

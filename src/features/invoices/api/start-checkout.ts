import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CheckoutStarted } from '../types';

/** Opens (or reuses) the provider's hosted checkout for what is still owed. */
export const startCheckout = (id: string) =>
  api.post<CheckoutStarted>(`/api/invoices/${encodeURIComponent(id)}/checkout`, {});

/** Starts checkout and sends the browser to the provider's page. */
export const useStartCheckout = () =>
  useMutation({
    mutationFn: startCheckout,
    onSuccess: ({ checkoutUrl }) => window.location.assign(checkoutUrl),
  });

import { QueryClientProvider } from '@tanstack/react-query';
import { RouterProvider } from 'react-router-dom';
import { ToastProvider } from '@/components/ui/toast';
import { queryClient } from '@/lib/query-client';
import { createRouter } from './router';

const router = createRouter(queryClient);

/** The app: server data, toasts and the router. */
export function AppProvider() {
  return (
    <QueryClientProvider client={queryClient}>
      <ToastProvider>
        <RouterProvider router={router} />
      </ToastProvider>
    </QueryClientProvider>
  );
}

import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';

/** Retries only what may succeed on a second try: network failures and server errors. */
function shouldRetry(failureCount: number, error: unknown) {
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

/** One query client for the app: short staleness, no retry on client errors. */
export function createQueryClient() {
  return new QueryClient({
    defaultOptions: {
      queries: { staleTime: 20_000, retry: shouldRetry, refetchOnWindowFocus: true },
      mutations: { retry: false },
    },
  });
}

export const queryClient = createQueryClient();

import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactNode } from 'react';
import { MemoryRouter } from 'react-router-dom';
import { vi } from 'vitest';
import type { SessionUser } from '@shared/schemas/users';
import { ToastProvider } from '@/components/ui/toast';
import { sessionKeys } from '@/lib/auth';

export const planner: SessionUser = {
  id: '00000000-0000-4000-8000-000000000001',
  email: 'planner@example.test',
  name: 'Pat Planner',
  role: 'planner',
  operationId: '00000000-0000-4000-8000-0000000000aa',
  operationName: 'Test Apiaries',
  growerId: null,
  units: 'imperial',
};

/** Renders UI with a fresh query cache (signed in as `user`), toasts and a router. */
export function renderWithProviders(
  ui: ReactNode,
  { user = planner }: { user?: SessionUser } = {},
) {
  const queryClient = new QueryClient({
    defaultOptions: { queries: { retry: false }, mutations: { retry: false } },
  });
  queryClient.setQueryData(sessionKeys.all, { user, csrfToken: 'test-csrf-token' });
  const result = render(
    <QueryClientProvider client={queryClient}>
      <ToastProvider>
        <MemoryRouter>{ui}</MemoryRouter>
      </ToastProvider>
    </QueryClientProvider>,
  );
  return { ...result, queryClient };
}

export interface RecordedRequest {
  method: string;
  url: string;
  headers: Record<string, string>;
  body: unknown;
}

type Reply = { status: number; body?: unknown; headers?: Record<string, string> };

/** Replaces fetch: each request is recorded and answered by `reply`. */
export function mockFetch(reply: (request: RecordedRequest) => Reply) {
  const requests: RecordedRequest[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const request: RecordedRequest = {
      method: init.method ?? 'GET',
      url: String(input),
      headers: (init.headers ?? {}) as Record<string, string>,
      body: typeof init.body === 'string' ? JSON.parse(init.body) : undefined,
    };
    requests.push(request);
    const { status, body, headers } = reply(request);
    return new Response(status === 204 ? null : JSON.stringify(body ?? {}), {
      status,
      headers: { 'Content-Type': 'application/json', ...headers },
    });
  });
  vi.stubGlobal('fetch', fetchMock);
  return { requests, fetchMock };
}

/** The API's error envelope. */
export const apiError = (
  status: number,
  code: string,
  message: string,
  details: unknown = [],
): Reply => ({
  status,
  body: { error: { code, message, details } },
});

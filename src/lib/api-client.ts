import type { ErrorCode, FieldIssue } from '@shared/api/errors';

/** An error answered by the API (or a network failure, status 0), with its stable code. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode | 'network',
    message: string,
    readonly details: FieldIssue[] | Record<string, unknown> = [],
    readonly retryAfterSeconds: number | null = null,
  ) {
    super(message);
    this.name = 'ApiError';
  }

  /** Field problems of a 400, or an empty list. */
  get fieldIssues(): FieldIssue[] {
    return Array.isArray(this.details) ? this.details : [];
  }
}

/** True when the error is a stale-version refusal (someone else saved first). */
export const isVersionConflict = (error: unknown): error is ApiError =>
  error instanceof ApiError && error.code === 'version_conflict';

let csrfToken: string | null = null;

/** Keeps the CSRF token of the latest session response for the next state-changing request. */
export function setCsrfToken(token: string | null) {
  csrfToken = token;
}

type UnauthenticatedHandler = () => void;

// Where an expired session goes: the router installs a handler that keeps the current path.
let onUnauthenticated: UnauthenticatedHandler = () => {
  const next = window.location.pathname + window.location.search;
  if (window.location.pathname !== '/sign-in') {
    window.location.assign(`/sign-in?next=${encodeURIComponent(next)}`);
  }
};

/** Replaces what happens when the API answers 401 outside the session endpoints. */
export function setUnauthenticatedHandler(handler: UnauthenticatedHandler) {
  onUnauthenticated = handler;
}

interface RequestOptions {
  body?: unknown;
  /** A multipart body; the browser sets its Content-Type with the boundary. */
  form?: FormData;
  query?: Record<string, string | number | boolean | null | undefined>;
  signal?: AbortSignal;
}

function withQuery(path: string, query: RequestOptions['query']) {
  if (!query) return path;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  const text = params.toString();
  return text ? `${path}?${text}` : path;
}

async function fetchToken(): Promise<string | null> {
  const response = await fetch('/api/session', {
    credentials: 'same-origin',
    headers: { Accept: 'application/json' },
  });
  const body = (await response.json().catch(() => null)) as { csrfToken?: string } | null;
  csrfToken = body?.csrfToken ?? null;
  return csrfToken;
}

async function toApiError(response: Response): Promise<ApiError> {
  const body = (await response.json().catch(() => null)) as {
    error?: { code: ErrorCode; message: string; details?: FieldIssue[] | Record<string, unknown> };
  } | null;
  const retryAfter = Number(response.headers.get('Retry-After'));
  const error = body?.error;
  return new ApiError(
    response.status,
    error?.code ?? 'internal',
    error?.message ?? `The server answered ${response.status}.`,
    error?.details ?? [],
    Number.isFinite(retryAfter) && retryAfter > 0 ? retryAfter : null,
  );
}

async function request<T>(
  method: string,
  path: string,
  options: RequestOptions = {},
  retried = false,
): Promise<T> {
  const unsafe = method !== 'GET' && method !== 'HEAD';
  if (unsafe && !csrfToken) await fetchToken();
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (options.body !== undefined && !options.form) headers['Content-Type'] = 'application/json';
  if (unsafe && csrfToken) headers['X-CSRF-Token'] = csrfToken;

  let response: Response;
  try {
    response = await fetch(withQuery(path, options.query), {
      method,
      headers,
      credentials: 'same-origin',
      body: options.form ?? (options.body === undefined ? undefined : JSON.stringify(options.body)),
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(
      0,
      'network',
      'Could not reach Duskhaul. Check the connection and try again.',
    );
  }

  if (response.ok) {
    if (response.status === 204) return undefined as T;
    const body = (await response.json()) as T;
    const token = (body as { csrfToken?: unknown } | null)?.csrfToken;
    if (typeof token === 'string') csrfToken = token;
    return body;
  }

  const error = await toApiError(response);
  // A token from before sign-in or a restart: fetch a fresh one and try once more.
  if (error.code === 'csrf_invalid' && !retried) {
    await fetchToken();
    return request<T>(method, path, options, true);
  }
  if (error.status === 401 && !path.startsWith('/api/session')) onUnauthenticated();
  throw error;
}

/** The JSON API under /api: same-origin cookies, CSRF header on writes, typed errors. */
export const api = {
  get: <T>(path: string, options?: Omit<RequestOptions, 'body' | 'form'>) =>
    request<T>('GET', path, options),
  post: <T>(path: string, body?: unknown) => request<T>('POST', path, { body }),
  /** Posts multipart form data (file uploads) with the CSRF header and no JSON Content-Type. */
  postForm: <T>(path: string, form: FormData) => request<T>('POST', path, { form }),
  put: <T>(path: string, body?: unknown) => request<T>('PUT', path, { body }),
  patch: <T>(path: string, body?: unknown) => request<T>('PATCH', path, { body }),
  delete: <T>(path: string) => request<T>('DELETE', path),
};

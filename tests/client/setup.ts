import { cleanup } from '@testing-library/react';
import { afterEach, beforeEach, vi } from 'vitest';
import { setCsrfToken } from '@/lib/api-client';

beforeEach(() => {
  setCsrfToken('test-csrf-token');
});

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

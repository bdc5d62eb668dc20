import { api } from '@/lib/api-client';
import type { SyncChange, SyncResult } from '../types';

/** Sends a batch of queued changes; each is applied at most once thanks to its idempotency key. */
export const syncChanges = (changes: SyncChange[]) =>
  api.post<{ results: SyncResult[] }>('/api/moves/sync', { changes });

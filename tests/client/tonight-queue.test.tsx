import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { SyncBar } from '@/features/tonight/components/sync-bar';
import { OfflineQueue, type SendChanges } from '@/features/tonight/lib/offline-queue';
import { memoryStorage } from '@/features/tonight/lib/storage';
import { TonightProvider } from '@/features/tonight/lib/tonight-context';
import type { SyncChange, SyncResult } from '@/features/tonight/types';
import { ApiError } from '@/lib/api-client';
import { mockFetch, renderWithProviders } from './support';

const moveId = '11111111-1111-4111-8111-111111111111';
const loadId = '22222222-2222-4222-8222-222222222222';

const counts = (palletsLoaded: number) => ({
  kind: 'load-counts' as const,
  moveId,
  loadId,
  baseVersion: 1,
  payload: { palletsLoaded },
  label: `Rig Amber: ${palletsLoaded} pallets loaded`,
});
const status = (to: string) => ({
  kind: 'status' as const,
  moveId,
  baseVersion: 4,
  payload: { status: to },
  label: `Move: ${to}`,
});

/** A server that applies every change and bumps versions as the real one does. */
function applyingServer() {
  const versions: Record<string, number> = { load: 1, move: 4 };
  const batches: SyncChange[][] = [];
  const send: SendChanges = async (changes) => {
    batches.push(changes);
    const results: SyncResult[] = changes.map((c, index) => {
      const record = c.kind === 'load-counts' ? 'load' : 'move';
      if (c.version !== undefined && c.version !== versions[record])
        return {
          index,
          idempotencyKey: c.idempotencyKey,
          kind: c.kind,
          moveId,
          loadId: null,
          outcome: 'conflict',
          status: 409,
          current: { version: versions[record] },
        };
      versions[record] += 1;
      return {
        index,
        idempotencyKey: c.idempotencyKey,
        kind: c.kind,
        moveId,
        loadId: c.loadId ?? null,
        outcome: 'applied',
        status: 200,
        record: { version: versions[record] },
      };
    });
    return { results };
  };
  return { send, batches, versions };
}

describe('OfflineQueue', () => {
  it('when changes are queued then they stay in storage for the next visit, counts merged into one', async () => {
    const storage = memoryStorage();
    const queue = new OfflineQueue(storage, vi.fn());
    await queue.enqueue(counts(1));
    await queue.enqueue(counts(2));
    await queue.enqueue(status('loading'));

    const later = new OfflineQueue(storage, vi.fn());
    await later.load();
    const kept = later.getState().changes;
    expect(kept.map((c) => c.kind)).toEqual(['load-counts', 'status']);
    expect(kept[0].payload).toEqual({ palletsLoaded: 2 });
    expect(new Set(kept.map((c) => c.idempotencyKey)).size).toBe(2);
  });

  it('when there is no signal then sync keeps every change and says the server is unreachable', async () => {
    const send = vi.fn(async () => {
      throw new ApiError(0, 'network', 'Could not reach Duskhaul.');
    });
    const queue = new OfflineQueue(memoryStorage(), send);
    await queue.enqueue(counts(3));
    await queue.sync();
    expect(queue.getState().changes).toHaveLength(1);
    expect(queue.getState().unreachable).toBe(true);
  });

  it('when synced then applied changes leave the queue and a chain of status changes goes one per round with the new version', async () => {
    const server = applyingServer();
    const onApplied = vi.fn();
    const queue = new OfflineQueue(memoryStorage(), server.send, onApplied);
    await queue.enqueue(counts(3));
    await queue.enqueue(status('loading'));
    await queue.enqueue(status('rolling'));
    await queue.enqueue(status('placed'));
    await queue.sync();

    expect(queue.getState().changes).toEqual([]);
    expect(server.batches.map((b) => b.map((c) => c.version))).toEqual([[1, 4], [5], [6]]);
    expect(server.versions).toEqual({ load: 2, move: 7 });
    expect(onApplied).toHaveBeenCalledTimes(1);
  });

  it('when a change is made before the view caught up with an applied one then it builds on the version that one produced', async () => {
    const server = applyingServer();
    const queue = new OfflineQueue(memoryStorage(), server.send);
    await queue.enqueue(counts(3)); // made on version 1
    await queue.sync(); // applied: the load is at version 2
    // The view was not fetched again (no signal): the next change is still made on version 1.
    await queue.enqueue({ ...counts(4), payload: { coloniesLeftBehind: 2 } });
    await queue.sync();
    expect(server.batches.map((b) => b.map((c) => c.version))).toEqual([[1], [2]]);
    expect(queue.getState().changes).toEqual([]);

    // Someone else's change in between is still a conflict: the server is past what we made.
    server.versions.load += 1;
    await queue.enqueue({ ...counts(5), baseVersion: 1 });
    await queue.sync();
    expect(server.batches.at(-1)!.map((c) => c.version)).toEqual([3]);
    expect(queue.getState().changes.map((c) => c.state)).toEqual(['conflict']);
  });

  it('when a retried batch comes back as duplicates then they leave the queue too', async () => {
    const send: SendChanges = async (changes) => ({
      results: changes.map((c, index) => ({
        index,
        idempotencyKey: c.idempotencyKey,
        kind: c.kind,
        moveId,
        loadId: null,
        outcome: 'duplicate',
        status: 200,
        record: { version: 2 },
      })),
    });
    const queue = new OfflineQueue(memoryStorage(), send);
    await queue.enqueue(counts(5));
    await queue.sync();
    expect(queue.getState().changes).toEqual([]);
  });
});

describe('SyncBar', () => {
  it('when the office changed a load first then the conflict is shown with its record and can be redone on top', async () => {
    const storage = memoryStorage();
    const seeded = new OfflineQueue(storage, vi.fn());
    await seeded.enqueue(counts(7));
    mockFetch(() => ({ status: 200, body: {} }));
    let current = 3;
    const send = vi.fn<SendChanges>(async (changes) => ({
      results: changes.map((c, index) =>
        c.version === current
          ? {
              index,
              idempotencyKey: c.idempotencyKey,
              kind: c.kind,
              moveId,
              loadId,
              outcome: 'applied' as const,
              status: 200,
              record: { version: ++current },
            }
          : {
              index,
              idempotencyKey: c.idempotencyKey,
              kind: c.kind,
              moveId,
              loadId,
              outcome: 'conflict' as const,
              status: 409,
              current: { palletsLoaded: 40, coloniesPlaced: null, version: current },
              error: { code: 'version_conflict', message: 'The load changed since you read it.' },
            },
      ),
    }));
    const user = userEvent.setup();
    renderWithProviders(
      <TonightProvider storage={storage} send={send}>
        <SyncBar />
      </TonightProvider>,
    );

    const problems = await screen.findByRole('region', { name: 'Changes the office did not take' });
    expect(within(problems).getByText('Rig Amber: 7 pallets loaded')).toBeTruthy();
    expect(within(problems).getByText(/Someone changed this first. The load changed/)).toBeTruthy();
    const record = within(problems).getByLabelText("The office's record now");
    expect(record.textContent).toContain('Pallets loaded40');
    // Never dropped silently: it stays on the device until the crew chooses.
    expect((await storage.listChanges())[0].state).toBe('conflict');
    expect(screen.getByTestId('sync-status').textContent).toBe('1 change the office did not take');

    await user.click(within(problems).getByRole('button', { name: 'Redo mine on top' }));
    await screen.findByText('Everything is sent');
    expect(send.mock.calls.at(-1)![0][0]).toMatchObject({
      version: 3,
      payload: { palletsLoaded: 7 },
    });
    expect(await storage.listChanges()).toEqual([]);
  });
  it('when someone else left a change on the phone then it is shown apart, not sent, and can be discarded', async () => {
    const storage = memoryStorage();
    const earlier = new OfflineQueue(storage, vi.fn());
    earlier.setUser('someone-else');
    await earlier.enqueue(counts(9));
    mockFetch(() => ({ status: 200, body: {} }));
    const send = vi.fn<SendChanges>();
    const user = userEvent.setup();
    renderWithProviders(
      <TonightProvider storage={storage} send={send}>
        <SyncBar />
      </TonightProvider>,
    );
    const theirs = await screen.findByRole('region', {
      name: 'Changes someone else left on this phone',
    });
    expect(within(theirs).getByText('Rig Amber: 9 pallets loaded')).toBeTruthy();
    expect(screen.getByTestId('sync-status').textContent).toBe('Everything is sent');
    expect(send).not.toHaveBeenCalled();
    await user.click(within(theirs).getByRole('button', { name: 'Discard' }));
    expect(await storage.listChanges()).toEqual([]);
  });
});

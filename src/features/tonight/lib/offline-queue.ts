import { ApiError } from '@/lib/api-client';
import type { SyncChange, SyncResult } from '../types';
import type { QueuedChange, TonightStorage } from './storage';

export type SendChanges = (changes: SyncChange[]) => Promise<{ results: SyncResult[] }>;

export interface NewChange {
  kind: QueuedChange['kind'];
  moveId: string;
  loadId?: string;
  baseVersion?: number;
  payload: Record<string, unknown>;
  label: string;
}

export interface QueueState {
  changes: QueuedChange[];
  syncing: boolean;
  /** The last sync could not reach the server. */
  unreachable: boolean;
  lastSyncedAt: string | null;
}

/** The record a versioned change is made on: one load, or the move itself. */
const recordOf = (c: Pick<QueuedChange, 'kind' | 'moveId' | 'loadId'>) =>
  c.kind === 'load-counts' ? `load:${c.loadId}` : c.kind === 'status' ? `move:${c.moveId}` : null;

const newKey = () =>
  typeof crypto !== 'undefined' && 'randomUUID' in crypto
    ? crypto.randomUUID()
    : `k-${Date.now()}-${Math.random().toString(36).slice(2, 12)}`;

/**
 * Changes made on the device, kept in storage until the server has them. Sends them in rounds:
 * one change per record per round, so a second change made on top of the first goes with the
 * version the first one produced. Applied and duplicate changes leave the queue; conflicts and
 * refusals stay, shown to the crew, until they redo or discard them.
 */
export class OfflineQueue {
  private state: QueueState = {
    changes: [],
    syncing: false,
    unreachable: false,
    lastSyncedAt: null,
  };
  private listeners = new Set<() => void>();
  private loaded: Promise<void> | null = null;
  private seq = 0;
  /** Who is signed in: changes are stamped with them, and only theirs are sent. */
  private userId: string | null = null;
  /**
   * Per record, the version each of this device's applied changes was made on → the version it
   * produced. The view catches up only when Tonight is fetched again (which may fail with no
   * signal); until then a new change is made on a version this device has itself moved past.
   */
  private produced = new Map<string, Map<number, number>>();

  constructor(
    private readonly storage: TonightStorage,
    private readonly send: SendChanges,
    private readonly onApplied: () => void = () => undefined,
  ) {}

  subscribe = (listener: () => void) => {
    this.listeners.add(listener);
    return () => void this.listeners.delete(listener);
  };

  getState = () => this.state;

  /** The signed-in user; others' changes left on the phone wait for them (or a discard). */
  setUser(userId: string | null) {
    if (this.userId === userId) return;
    this.userId = userId;
    this.set({});
  }

  /** A change made by someone other than the signed-in user (kept, not sent). */
  isOthers = (change: QueuedChange) => Boolean(change.madeBy && change.madeBy !== this.userId);

  private set(patch: Partial<QueueState>) {
    this.state = { ...this.state, ...patch };
    for (const listener of this.listeners) listener();
  }

  /** Reads the queue kept on the device (once). */
  load() {
    this.loaded ??= this.storage.listChanges().then((changes) => {
      this.seq = changes.reduce((max, c) => Math.max(max, c.seq), 0);
      this.set({ changes });
    });
    return this.loaded;
  }

  private async save(change: QueuedChange) {
    await this.storage.putChange(change);
    const others = this.state.changes.filter((c) => c.idempotencyKey !== change.idempotencyKey);
    this.set({ changes: [...others, change].sort((a, b) => a.seq - b.seq) });
  }

  private async drop(key: string) {
    await this.storage.removeChange(key);
    this.set({ changes: this.state.changes.filter((c) => c.idempotencyKey !== key) });
  }

  /** Queues a change; counts on a load merge into its not-yet-sent change. */
  async enqueue(input: NewChange) {
    await this.load();
    if (input.kind === 'load-counts') {
      const pending = this.state.changes.find(
        (c) =>
          c.kind === 'load-counts' &&
          c.loadId === input.loadId &&
          c.state === 'waiting' &&
          !c.attempted &&
          !this.isOthers(c),
      );
      if (pending) {
        await this.save({
          ...pending,
          payload: { ...pending.payload, ...input.payload },
          label: input.label,
        });
        return;
      }
    }
    await this.save({
      ...input,
      ...this.caughtUp(input),
      ...(this.userId ? { madeBy: this.userId } : {}),
      idempotencyKey: newKey(),
      seq: ++this.seq,
      queuedAt: new Date().toISOString(),
      attempted: false,
      state: 'waiting',
    });
  }

  /** Changes not yet on the server: waiting, or a conflict or refusal not yet settled. */
  async unsent() {
    await this.load();
    return this.state.changes.length;
  }

  /** Forgets every change and snapshot on the device (sign-out). */
  async forgetAll() {
    await this.load();
    await this.storage.clear();
    this.set({ changes: [], unreachable: false, lastSyncedAt: null });
  }

  /** Forgets a change (a conflict or refusal the crew chose not to redo). */
  discard = (key: string) => this.drop(key);

  /** Sends a conflicting change again on top of the server's current record. */
  async redo(key: string) {
    const change = this.state.changes.find((c) => c.idempotencyKey === key);
    if (!change) return;
    await this.drop(key);
    await this.save({
      ...change,
      idempotencyKey: newKey(),
      baseVersion: change.current?.version ?? change.baseVersion,
      attempted: false,
      state: 'waiting',
      current: undefined,
      message: undefined,
    });
  }

  /** Sends what is waiting; stops quietly when the server cannot be reached. */
  async sync() {
    await this.load();
    if (this.state.syncing) return;
    this.set({ syncing: true });
    let appliedAny = false;
    try {
      for (let round = 0; round < 50; round++) {
        // Sent as the signed-in user, so only their own changes go.
        const waiting = this.state.changes.filter(
          (c) => c.state === 'waiting' && !this.isOthers(c),
        );
        if (waiting.length === 0) break;
        const seen = new Set<string>();
        const batch = waiting
          .filter((c) => {
            const record = recordOf(c);
            if (!record) return true;
            if (seen.has(record)) return false;
            seen.add(record);
            return true;
          })
          .slice(0, 200);
        for (const c of batch) if (!c.attempted) await this.save({ ...c, attempted: true });
        let results: SyncResult[];
        try {
          ({ results } = await this.send(
            batch.map((c) => ({
              idempotencyKey: c.idempotencyKey,
              kind: c.kind,
              moveId: c.moveId,
              ...(c.loadId ? { loadId: c.loadId } : {}),
              ...(c.baseVersion !== undefined ? { version: c.baseVersion } : {}),
              payload: c.payload,
            })),
          ));
        } catch (error) {
          if (error instanceof ApiError && (error.status === 0 || error.status >= 500)) {
            this.set({ unreachable: true });
            return;
          }
          throw error;
        }
        this.set({ unreachable: false, lastSyncedAt: new Date().toISOString() });
        let progressed = false;
        for (const result of results) {
          const sent = batch[result.index];
          if (!sent) continue;
          if (result.outcome === 'applied' || result.outcome === 'duplicate') {
            progressed = appliedAny = true;
            await this.drop(sent.idempotencyKey);
            await this.rebase(sent, result.record?.version);
          } else if (result.outcome === 'conflict') {
            progressed = true;
            await this.save({
              ...sent,
              state: 'conflict',
              current: result.current,
              message: result.error?.message ?? 'Someone changed this first.',
            });
          } else if (result.outcome === 'rejected') {
            progressed = true;
            await this.save({
              ...sent,
              state: 'rejected',
              message: result.error?.message ?? 'The server refused this change.',
            });
          }
          // failed: rolled back on the server, the key not kept; it stays waiting for a retry.
        }
        if (!progressed) break;
      }
    } finally {
      this.set({ syncing: false });
      if (appliedAny) this.onApplied();
    }
  }

  /**
   * The change's base version moved past this device's own applied changes: made on a view that
   * has not caught up with them, it builds on what they produced (someone else's change since
   * still shows as a conflict, as the server's version is then newer still).
   */
  private caughtUp(input: NewChange): { baseVersion?: number } {
    const record = recordOf(input);
    const chain = record ? this.produced.get(record) : undefined;
    let version = input.baseVersion;
    if (!chain || version === undefined) return {};
    while (chain.has(version)) version = chain.get(version)!;
    return { baseVersion: version };
  }

  /** Changes made on top of `applied` now build on the version it produced. */
  private async rebase(applied: QueuedChange, version: number | undefined) {
    const record = recordOf(applied);
    if (!record || version === undefined) return;
    if (applied.baseVersion !== undefined) {
      const chain = this.produced.get(record) ?? new Map<number, number>();
      chain.set(applied.baseVersion, version);
      this.produced.set(record, chain);
    }
    for (const c of this.state.changes) {
      if (c.state !== 'waiting' || recordOf(c) !== record || c.baseVersion !== applied.baseVersion)
        continue;
      // A key already sent must never carry a different change: give it a new one.
      await this.drop(c.idempotencyKey);
      await this.save({
        ...c,
        baseVersion: version,
        ...(c.attempted ? { idempotencyKey: newKey(), attempted: false } : {}),
      });
    }
  }
}

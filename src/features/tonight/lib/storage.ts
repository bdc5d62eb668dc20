import { openDB, type IDBPDatabase } from 'idb';
import type { SyncKind } from '@shared/schemas/moves';
import type { TonightSnapshot } from '../types';

/** A change made on the device, waiting to be sent (or shown back to the crew). */
export interface QueuedChange {
  idempotencyKey: string;
  /** Order of making; changes are sent in this order. */
  seq: number;
  kind: SyncKind;
  moveId: string;
  loadId?: string;
  /** The record's version the change was made on (load-counts and status). */
  baseVersion?: number;
  payload: Record<string, unknown>;
  /** Who made it (user id): only they send it; absent on changes kept before this was recorded. */
  madeBy?: string;
  /** What the crew did, in their words: "Semi 1: 12 pallets loaded". */
  label: string;
  queuedAt: string;
  /** Sent at least once with this key (its payload and version may no longer change). */
  attempted: boolean;
  state: 'waiting' | 'conflict' | 'rejected';
  /** Conflict: the record as the server has it now. */
  current?: Record<string, unknown> & { version?: number };
  /** Conflict or refusal: the server's message. */
  message?: string;
}

/** Where Tonight keeps its queue and its last snapshot; IndexedDB in the browser. */
export interface TonightStorage {
  listChanges(): Promise<QueuedChange[]>;
  putChange(change: QueuedChange): Promise<void>;
  removeChange(idempotencyKey: string): Promise<void>;
  loadSnapshot(key: string): Promise<TonightSnapshot | undefined>;
  saveSnapshot(key: string, snapshot: TonightSnapshot): Promise<void>;
  /** Forgets every change and snapshot (at sign-out: the next person sees none of it). */
  clear(): Promise<void>;
}

/** Kept in memory only: for tests, and where IndexedDB is missing. */
export function memoryStorage(): TonightStorage {
  const changes = new Map<string, QueuedChange>();
  const snapshots = new Map<string, TonightSnapshot>();
  const clone = <T>(value: T): T => structuredClone(value);
  return {
    listChanges: async () => [...changes.values()].map(clone).sort((a, b) => a.seq - b.seq),
    putChange: async (change) => void changes.set(change.idempotencyKey, clone(change)),
    removeChange: async (key) => void changes.delete(key),
    loadSnapshot: async (key) => (snapshots.has(key) ? clone(snapshots.get(key)!) : undefined),
    saveSnapshot: async (key, snapshot) => void snapshots.set(key, clone(snapshot)),
    clear: async () => {
      changes.clear();
      snapshots.clear();
    },
  };
}

const DB_NAME = 'duskhaul-tonight';

/** The device's IndexedDB: one store of queued changes, one of snapshots. */
export function indexedDbStorage(): TonightStorage {
  let db: Promise<IDBPDatabase> | null = null;
  const open = () =>
    (db ??= openDB(DB_NAME, 1, {
      upgrade(database) {
        database.createObjectStore('changes', { keyPath: 'idempotencyKey' });
        database.createObjectStore('snapshots');
      },
    }));
  return {
    listChanges: async () =>
      ((await (await open()).getAll('changes')) as QueuedChange[]).sort((a, b) => a.seq - b.seq),
    putChange: async (change) => void (await (await open()).put('changes', change)),
    removeChange: async (key) => (await open()).delete('changes', key),
    loadSnapshot: async (key) => (await (await open()).get('snapshots', key)) as TonightSnapshot,
    saveSnapshot: async (key, snapshot) =>
      void (await (await open()).put('snapshots', snapshot, key)),
    clear: async () => {
      const tx = (await open()).transaction(['changes', 'snapshots'], 'readwrite');
      await Promise.all([
        tx.objectStore('changes').clear(),
        tx.objectStore('snapshots').clear(),
        tx.done,
      ]);
    },
  };
}

/** IndexedDB when the browser has it, else memory. */
export const defaultStorage = (): TonightStorage =>
  typeof indexedDB === 'undefined' ? memoryStorage() : indexedDbStorage();

let sharedStorage: TonightStorage | null = null;

/** The page's one storage for Tonight (the route's loader and the screen share it). */
export const deviceStorage = (): TonightStorage => (sharedStorage ??= defaultStorage());

import { useQueryClient } from '@tanstack/react-query';
import {
  createContext,
  useContext,
  useEffect,
  useState,
  useSyncExternalStore,
  type ReactNode,
} from 'react';
import { syncChanges } from '../api/sync-changes';
import { tonightKeys } from '../api/keys';
import { useUser } from '@/lib/auth';
import { OfflineQueue, type SendChanges } from './offline-queue';
import { deviceStorage, type TonightStorage } from './storage';

interface TonightDevice {
  storage: TonightStorage;
  queue: OfflineQueue;
}

const TonightContext = createContext<TonightDevice | null>(null);

let shared: TonightDevice | null = null;
/** What the mounted Tonight does when the shared queue lands changes (refresh its queries). */
let onSharedApplied: () => void = () => undefined;

/** The page's queue, made on first use (sign-out needs it even when Tonight was never opened). */
function sharedDevice(): TonightDevice {
  if (!shared) {
    const store = deviceStorage();
    shared = {
      storage: store,
      queue: new OfflineQueue(store, syncChanges, () => onSharedApplied()),
    };
  }
  return shared;
}

/** The service worker's copy of API answers (see vite.config.ts, runtimeCaching). */
const API_CACHE = 'duskhaul-api';

/**
 * Changes made in Tonight that the office does not have yet, after one last try to send them.
 * Sign-out asks before it throws them away.
 */
export async function unsentTonightChanges(userId: string): Promise<number> {
  const { queue } = sharedDevice();
  queue.setUser(userId);
  if ((await queue.unsent()) > 0 && navigator.onLine !== false) await queue.sync();
  return queue.unsent();
}

/**
 * At sign-out: forgets Tonight's queue and snapshots and the service worker's cached API answers,
 * so the next person on this phone sees none of them and no cached session answers for them.
 */
export async function forgetTonightOnThisDevice() {
  await sharedDevice().queue.forgetAll();
  if (typeof caches !== 'undefined') await caches.delete(API_CACHE);
}

/**
 * The device's storage and queue for Tonight. Tests pass a memory storage and their own send;
 * the app uses IndexedDB and POST /api/moves/sync, one queue for the page's life.
 */
export function TonightProvider({
  storage,
  send = syncChanges,
  children,
}: {
  storage?: TonightStorage;
  send?: SendChanges;
  children: ReactNode;
}) {
  const queryClient = useQueryClient();
  const [device] = useState<TonightDevice>(() => {
    const onApplied = () => {
      void queryClient.invalidateQueries({ queryKey: tonightKeys.all });
      // The moves screens show the same records: refresh them too.
      void queryClient.invalidateQueries({ queryKey: ['moves'] });
    };
    if (storage) return { storage, queue: new OfflineQueue(storage, send, onApplied) };
    onSharedApplied = onApplied;
    return sharedDevice();
  });

  const userId = useUser().id;
  useEffect(() => {
    const { queue } = device;
    queue.setUser(userId);
    void queue.load().then(() => queue.sync());
    const onOnline = () => void queue.sync();
    window.addEventListener('online', onOnline);
    // A quiet retry while anything waits, in case the browser never says it is back online.
    const timer = setInterval(() => {
      const waiting = queue.getState().changes.some((c) => c.state === 'waiting');
      if (waiting && navigator.onLine !== false) void queue.sync();
    }, 15_000);
    return () => {
      window.removeEventListener('online', onOnline);
      clearInterval(timer);
    };
  }, [device, userId]);

  return <TonightContext.Provider value={device}>{children}</TonightContext.Provider>;
}

export function useTonightDevice(): TonightDevice {
  const device = useContext(TonightContext);
  if (!device) throw new Error('useTonightDevice needs a TonightProvider.');
  return device;
}

/** The queue's state, re-rendering on every change. */
export function useQueueState() {
  const { queue } = useTonightDevice();
  return useSyncExternalStore(queue.subscribe, queue.getState);
}

/** Whether the browser believes it has a network. */
export function useOnline() {
  return useSyncExternalStore(
    (listener) => {
      window.addEventListener('online', listener);
      window.addEventListener('offline', listener);
      return () => {
        window.removeEventListener('online', listener);
        window.removeEventListener('offline', listener);
      };
    },
    () => navigator.onLine,
  );
}

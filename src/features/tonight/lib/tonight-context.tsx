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
import { OfflineQueue, type SendChanges } from './offline-queue';
import { deviceStorage, type TonightStorage } from './storage';

interface TonightDevice {
  storage: TonightStorage;
  queue: OfflineQueue;
}

const TonightContext = createContext<TonightDevice | null>(null);

let shared: TonightDevice | null = null;

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
    if (!shared) {
      const store = deviceStorage();
      shared = { storage: store, queue: new OfflineQueue(store, send, onApplied) };
    }
    return shared;
  });

  useEffect(() => {
    const { queue } = device;
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
  }, [device]);

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

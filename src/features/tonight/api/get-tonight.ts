import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import type { LoadSheet } from '@shared/schemas/load-sheet';
import type { MoveStatus } from '@shared/schemas/moves';
import { api, ApiError } from '@/lib/api-client';
import { addDays } from '../lib/dates';
import type { TonightStorage } from '../lib/storage';
import type { TonightMove, TonightSnapshot } from '../types';
import { tonightKeys } from './keys';

const ACTIVE: MoveStatus[] = ['planned', 'loading', 'rolling'];

interface MoveSummary {
  id: string;
  name: string;
  nightOf: string;
  status: MoveStatus;
  version: number;
}

/** Today's and tomorrow's moves (or, with none, the next night's) with their load sheets. */
export async function getTonight(today: string): Promise<TonightSnapshot> {
  // From yesterday: a haul that started last night may still be rolling this morning.
  const list = await api.get<ListResult<MoveSummary>>('/api/moves', {
    query: { from: addDays(today, -1), limit: 200 },
  });
  const active = list.items
    .filter((m) => ACTIVE.includes(m.status))
    .sort((a, b) => a.nightOf.localeCompare(b.nightOf));
  const tomorrow = addDays(today, 1);
  let chosen = active.filter(
    (m) =>
      (m.nightOf >= today && m.nightOf <= tomorrow) ||
      (m.nightOf < today && m.status !== 'planned'),
  );
  const upcoming = chosen.length === 0 && active.length > 0;
  if (upcoming) chosen = active.filter((m) => m.nightOf === active[0].nightOf && m.nightOf > today);
  const moves = await Promise.all(
    chosen.map(async (m): Promise<TonightMove> => {
      const sheet = await api.get<LoadSheet>(`/api/moves/${encodeURIComponent(m.id)}/load-sheet`);
      return {
        id: m.id,
        name: m.name,
        nightOf: m.nightOf,
        status: m.status,
        version: m.version,
        destinations: sheet.destinations.map((d) => ({
          id: d.id,
          name: d.name,
          accessNotes: d.accessNotes,
        })),
        cautions: sheet.cautions,
        // Only trucks with a saved load can be recorded on (a plan computed now has none).
        loads: sheet.pages.flatMap((p) =>
          p.loadId && p.recorded
            ? [
                {
                  loadId: p.loadId,
                  key: p.key,
                  truckName: p.truckName,
                  driverNames: p.driverNames,
                  pallets: p.pallets,
                  colonies: p.colonies,
                  departure: p.departure,
                  arrival: p.arrival,
                  stops: p.stops,
                  recorded: p.recorded,
                },
              ]
            : [],
        ),
      };
    }),
  );
  return {
    fetchedAt: new Date().toISOString(),
    nights: [...new Set(chosen.map((m) => m.nightOf))],
    upcoming,
    moves,
  };
}

/**
 * Tonight from the network when there is signal (kept on the device), else the copy kept last
 * time. It runs offline too (networkMode 'always'), so the kept copy answers at once.
 */
export const getTonightQueryOptions = (today: string, storage: TonightStorage) =>
  queryOptions({
    queryKey: tonightKeys.night(today),
    networkMode: 'always',
    retry: false,
    queryFn: async () => {
      try {
        const snapshot = await getTonight(today);
        await storage.saveSnapshot(today, snapshot).catch(() => undefined);
        return snapshot;
      } catch (error) {
        const offline = error instanceof ApiError && (error.status === 0 || error.status >= 500);
        const kept = offline ? await storage.loadSnapshot(today).catch(() => undefined) : undefined;
        if (kept) return kept;
        throw error;
      }
    },
  });

export const useTonight = (today: string, storage: TonightStorage) =>
  useQuery(getTonightQueryOptions(today, storage));

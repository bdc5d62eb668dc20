import { apportion } from './apportion';
import { stopKey } from './pick-up-stops';

/** Colonies a move takes from one yard's lot (one origin of the move). */
export interface OriginColonies {
  yardId: string;
  lotId: string;
  colonies: number;
}

/** What the crew recorded on one truck that decides where its colonies end up. */
export interface TruckLeftAndLost {
  coloniesLeftBehind: number | null;
  /** Left behind per pick-up stop; when given, these are exact. */
  leftBehindByStop: Array<{ yardId: string; lotId: string; colonies: number }> | null;
  coloniesLost: number | null;
  /** The truck's planned pick-up stops (empty when unknown). */
  stops: Array<{ yardId: string; lotId: string }>;
}

export type PlacementSplit =
  | { ok: true; leftBehind: number[]; lost: number[] }
  /** More left behind and lost than the move takes. */
  | { ok: false; leftBehind: number; lost: number; total: number }
  /** More left behind at one origin (by its index) than the move takes from it. */
  | { ok: false; origin: number; leftBehind: number };

/**
 * How many of each origin's colonies stay in the yard and how many are lost on the road, given
 * the trucks' records.
 *
 * Colonies left behind stay in the yard they were left in: counted per stop they are exact, and a
 * truck's bare total is exact too when the truck had one stop. Only the bare totals of trucks with
 * several stops (an older phone, or the office typing a total), and any counted at a stop that is
 * no longer an origin of the move, are shared over the origins in proportion to what each still
 * sends (largest remainder). Lost colonies fell off a moving truck whose load mixes its stops, so
 * they are shared the same way over what was not left behind.
 */
export function splitLeftAndLost(
  origins: readonly OriginColonies[],
  trucks: readonly TruckLeftAndLost[],
): PlacementSplit {
  const index = new Map(origins.map((o, i) => [stopKey(o), i]));
  const exact = origins.map(() => 0);
  let shared = 0;
  for (const truck of trucks) {
    const byStop = truck.leftBehindByStop;
    const oneStop = truck.stops.length === 1 ? truck.stops[0] : null;
    const counts =
      byStop ?? (oneStop ? [{ ...oneStop, colonies: truck.coloniesLeftBehind ?? 0 }] : []);
    let counted = 0;
    for (const count of counts) {
      const i = index.get(stopKey(count));
      if (i === undefined) continue;
      exact[i] += count.colonies;
      counted += count.colonies;
    }
    shared += Math.max(0, (truck.coloniesLeftBehind ?? 0) - counted);
  }

  const total = origins.reduce((sum, o) => sum + o.colonies, 0);
  const lostTotal = trucks.reduce((sum, t) => sum + (t.coloniesLost ?? 0), 0);
  const leftTotal = exact.reduce((a, b) => a + b, 0) + shared;
  if (leftTotal + lostTotal > total) {
    return { ok: false, leftBehind: leftTotal, lost: lostTotal, total };
  }
  for (const [i, origin] of origins.entries()) {
    if (exact[i] > origin.colonies) {
      return { ok: false, origin: i, leftBehind: exact[i] };
    }
  }
  const sharedPer = apportion(
    shared,
    origins.map((o, i) => o.colonies - exact[i]),
  );
  const leftBehind = exact.map((n, i) => n + sharedPer[i]);
  const lost = apportion(
    lostTotal,
    origins.map((o, i) => o.colonies - leftBehind[i]),
  );
  return { ok: true, leftBehind, lost };
}

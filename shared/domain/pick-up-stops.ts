/** A pick-up stop of a truck: one yard and the lot taken from it. */
export interface StopRef {
  yardId: string;
  lotId: string;
}

/** One key per stop, for maps and sets. */
export const stopKey = (stop: StopRef) => `${stop.yardId}:${stop.lotId}`;

/**
 * What was recorded at one stop of a truck: its entry in the per-stop list when the truck has one
 * (null when the list leaves the stop out), else the truck's total if it has only this stop. Null
 * when nothing was recorded there.
 */
export function recordedAtStop<T extends StopRef>(
  byStop: readonly T[] | null,
  truckTotal: number | null,
  stops: readonly StopRef[],
  stop: StopRef,
  count: (entry: T) => number,
): number | null {
  if (byStop) {
    const entry = byStop.find((e) => stopKey(e) === stopKey(stop));
    return entry ? count(entry) : null;
  }
  return stops.length === 1 ? truckTotal : null;
}

/**
 * Move timeline (the calculation API's `move-window`): dusk at the origin, loading, departure,
 * driving under US hours-of-service, arrival, and dawn at the destination, each written in its own
 * place's time zone.
 *
 * Decisions (docs/calculations.md):
 * - Loading starts at civil dusk at the origin on `date` (foragers are home), or at `loadingStart`
 *   when given. Without a civil dusk (white nights) it starts at sunset, or at solar midnight when
 *   the Sun does not set; a note says so.
 * - distanceKm = great circle (turf) × roadFactor, unless a routed `distanceKm` is given.
 * - driveMinutes = distanceKm ÷ averageSpeedKmh; rests from hours-of-service.ts.
 * - Destination civil dawn and sunrise are the first after departure (DESIGN.md contract);
 *   arrivesBeforeDawn = arrival ≤ that civil dawn.
 * - The timeline only depends on time since loading began, so moving loading earlier by Δ moves
 *   arrival earlier by Δ: latestDepartureForDawn = civilDawn − (arrival − departure).
 * - Legs are written in the zone where the truck is estimated to be (along the great circle).
 */
import { greatCircleDistanceKm, positionAlongGreatCircle, type LatLon } from './distance';
import { assertInRange, assertLatLon } from './guards';
import { scheduleHaul, WEEKLY_NOTE_MINUTES } from './hours-of-service';
import { firstMorningEventAfter, sunEventsAt } from './sun';
import { parseCalendarDate } from './calendar-date';
import { formatDuration, formatLocalTime } from './local-time';
import { formatInstantInZone, timeZoneAt, zoneOffsetMinutes } from './time-zones';

/** Default ratio of road distance to great-circle distance (common practice, no source). */
export const DEFAULT_ROAD_FACTOR = 1.25;

const MINUTE_MS = 60_000;

/** Input of computeMoveWindow. */
export interface MoveWindowInput {
  /** Loading yard. */
  origin: LatLon;
  /** Unloading site. */
  destination: LatLon;
  /** The evening of loading, 'YYYY-MM-DD', local to the origin. */
  date: string;
  /** Loading time, minutes (on duty for driver 1). */
  loadingMinutes: number;
  /** Average speed including short stops, km/h. */
  averageSpeedKmh: number;
  /** Road distance ÷ great-circle distance (default 1.25). */
  roadFactor?: number;
  /** One driver or a team of two (default 1). */
  drivers?: 1 | 2;
  /** Loading start instant (ISO 8601 with offset, or a Date) instead of civil dusk. */
  loadingStart?: string | Date;
  /** Road distance from a routing service, km (replaces great circle × road factor). */
  distanceKm?: number;
}

/** One leg of the haul as the API returns it. */
export interface MoveLeg {
  /** 'drive' or 'rest'. */
  kind: 'drive' | 'rest';
  /** Start, ISO 8601 in the zone where the truck is. */
  start: string;
  /** End, ISO 8601 in the zone where the truck is. */
  end: string;
  /** Length, minutes. */
  minutes: number;
  /** Distance covered, km (drive legs). */
  distanceKm?: number;
  /** Driver at the wheel, 1 or 2 (drive legs). */
  driver?: number;
}

/** Result of computeMoveWindow (the calculation API's `move-window` response plus notes). */
export interface MoveWindow {
  /** Origin zone and evening events, ISO 8601 in the origin's zone (null when absent). */
  origin: { timeZone: string; sunset: string | null; civilDusk: string | null };
  /** Destination zone and the first dawn and sunrise after departure, in its zone. */
  destination: { timeZone: string; civilDawn: string | null; sunrise: string | null };
  /** Start of loading, origin zone. */
  loadingStart: string;
  /** End of loading, truck rolls, origin zone. */
  departure: string;
  /** End of driving, destination zone. */
  arrival: string;
  /** Road distance, km. */
  distanceKm: number;
  /** distanceKm ÷ averageSpeedKmh, minutes. */
  driveMinutes: number;
  /** Off-duty stops forced by hours-of-service rules, minutes. */
  restMinutes: number;
  /** arrival ≤ destination civil dawn; null without a dawn. */
  arrivesBeforeDawn: boolean | null;
  /** Latest departure still arriving by that dawn, origin zone; null without a dawn. */
  latestDepartureForDawn: string | null;
  /** Drive and rest legs. */
  legs: MoveLeg[];
  /** Explanations: missing twilight, clock changes, weekly hours. */
  notes: string[];
}

function formatOffset(minutes: number): string {
  const sign = minutes < 0 ? '−' : '+';
  const abs = Math.abs(minutes);
  return `UTC${sign}${Math.floor(abs / 60)}${abs % 60 ? `:${String(abs % 60).padStart(2, '0')}` : ''}`;
}

function parseInstant(name: string, value: string | Date): Date {
  const date = value instanceof Date ? value : new Date(value);
  if (typeof value === 'string' && !/(Z|[+-]\d{2}:?\d{2})$/i.test(value)) {
    throw new RangeError(
      `${name} must be an ISO 8601 instant with an offset, got ${JSON.stringify(value)}`,
    );
  }
  if (Number.isNaN(date.getTime()))
    throw new RangeError(`${name} is not a valid instant: ${String(value)}`);
  return date;
}

/** Computes the night's move timeline between two places under US hours-of-service rules. */
export function computeMoveWindow(input: MoveWindowInput): MoveWindow {
  const { origin, destination, date, loadingMinutes, averageSpeedKmh } = input;
  const roadFactor = input.roadFactor ?? DEFAULT_ROAD_FACTOR;
  const drivers = input.drivers ?? 1;
  assertLatLon('origin', origin?.lat, origin?.lon);
  assertLatLon('destination', destination?.lat, destination?.lon);
  parseCalendarDate(date);
  assertInRange('loadingMinutes', loadingMinutes, 0, 24 * 60);
  assertInRange('averageSpeedKmh', averageSpeedKmh, Number.MIN_VALUE, 200);
  assertInRange('roadFactor', roadFactor, 1, 5);
  if (drivers !== 1 && drivers !== 2)
    throw new RangeError(`drivers must be 1 or 2, got ${String(drivers)}`);
  if (input.distanceKm !== undefined) assertInRange('distanceKm', input.distanceKm, 0);

  const notes: string[] = [];
  const originZone = timeZoneAt(origin.lat, origin.lon);
  const destinationZone = timeZoneAt(destination.lat, destination.lon);
  const evening = sunEventsAt(origin.lat, origin.lon, date, originZone);
  notes.push(...evening.notes.map((n) => `Origin: ${n}`));

  let loadingStart: Date;
  if (input.loadingStart !== undefined) {
    loadingStart = parseInstant('loadingStart', input.loadingStart);
    if (evening.civilDusk && loadingStart < evening.civilDusk) {
      notes.push(
        'Loading starts before civil dusk: foragers may still be out and will be left behind.',
      );
    }
  } else if (evening.civilDusk) {
    loadingStart = evening.civilDusk;
  } else if (evening.sunset) {
    loadingStart = evening.sunset;
    notes.push('No civil dusk at the origin: loading starts at sunset.');
  } else {
    loadingStart = new Date(evening.solarNoon.getTime() + 12 * 60 * MINUTE_MS);
    notes.push('The Sun does not set at the origin: loading starts at solar midnight.');
  }
  const departure = new Date(loadingStart.getTime() + loadingMinutes * MINUTE_MS);

  const distanceKm = input.distanceKm ?? greatCircleDistanceKm(origin, destination) * roadFactor;
  if (input.distanceKm !== undefined) notes.push('Distance from the routing service.');
  const driveMinutes = (distanceKm / averageSpeedKmh) * 60;
  const schedule = scheduleHaul({
    onDutyStartMs: loadingStart.getTime(),
    departureMs: departure.getTime(),
    driveMinutes,
    averageSpeedKmh,
    drivers,
  });
  const arrival = new Date(schedule.arrivalMs);

  const civilDawn = firstMorningEventAfter(
    destination.lat,
    destination.lon,
    departure,
    destinationZone,
    'civilDawn',
  );
  const sunrise = firstMorningEventAfter(
    destination.lat,
    destination.lon,
    departure,
    destinationZone,
    'sunrise',
  );
  if (!civilDawn)
    notes.push(
      'No civil dawn at the destination in the days after departure (the Sun stays within 6° of the horizon).',
    );
  const haulMs = arrival.getTime() - departure.getTime();
  const latestDeparture = civilDawn ? new Date(civilDawn.getTime() - haulMs) : null;
  const arrivesBeforeDawn = civilDawn ? arrival.getTime() <= civilDawn.getTime() : null;

  if (latestDeparture && latestDeparture < departure && arrivesBeforeDawn === false) {
    const nextDawn = firstMorningEventAfter(
      destination.lat,
      destination.lon,
      arrival,
      destinationZone,
      'civilDawn',
      4,
    );
    notes.push(
      `Arrives ${formatDuration((arrival.getTime() - civilDawn!.getTime()) / MINUTE_MS)} after the first civil dawn.` +
        (nextDawn
          ? ` The next civil dawn after arrival is ${formatLocalTime(formatInstantInZone(nextDawn, destinationZone), destinationZone)}; departing up to ${formatDuration(Math.floor((nextDawn.getTime() - arrival.getTime()) / MINUTE_MS))} later would still arrive before it.`
          : ''),
    );
  }
  const originOffset = zoneOffsetMinutes(departure, originZone);
  const destinationOffset = zoneOffsetMinutes(arrival, destinationZone);
  if (originOffset !== destinationOffset) {
    notes.push(
      `Clocks differ: departure at ${formatOffset(originOffset)}, arrival at ${formatOffset(destinationOffset)}.`,
    );
  }
  if (zoneOffsetMinutes(loadingStart, originZone) !== zoneOffsetMinutes(arrival, originZone)) {
    notes.push(`Clocks change at the origin (${originZone}) during the move.`);
  }
  schedule.drivingMinutesByDriver.forEach((minutes, i) => {
    if (minutes > WEEKLY_NOTE_MINUTES) {
      notes.push(
        `Driver ${i + 1} drives ${Math.round(minutes / 60)} h: check the 60/70-hour weekly limit (49 CFR 395.3(b)).`,
      );
    }
  });
  if (drivers === 1 && schedule.restMinutes > 0) {
    notes.push(
      'The load stands during rests: in heat, park in shade and soak the bees; a second driver keeps it moving.',
    );
  }

  const totalDistanceKm = distanceKm;
  let coveredKm = 0;
  const zoneAtKm = (km: number): string => {
    if (totalDistanceKm === 0) return originZone;
    const share = Math.min(1, Math.max(0, km / totalDistanceKm));
    if (share === 0) return originZone;
    if (share === 1) return destinationZone;
    const p = positionAlongGreatCircle(origin, destination, share);
    return timeZoneAt(p.lat, p.lon);
  };
  const legs: MoveLeg[] = schedule.legs.map((leg) => {
    const startZone = zoneAtKm(coveredKm);
    if (leg.kind === 'drive') coveredKm += leg.distanceKm ?? 0;
    const endZone = zoneAtKm(coveredKm);
    return {
      kind: leg.kind,
      start: formatInstantInZone(new Date(leg.startMs), startZone),
      end: formatInstantInZone(new Date(leg.endMs), endZone),
      minutes: leg.minutes,
      ...(leg.kind === 'drive' ? { distanceKm: leg.distanceKm, driver: leg.driver } : {}),
    };
  });

  return {
    origin: {
      timeZone: originZone,
      sunset: evening.sunset ? formatInstantInZone(evening.sunset, originZone) : null,
      civilDusk: evening.civilDusk ? formatInstantInZone(evening.civilDusk, originZone) : null,
    },
    destination: {
      timeZone: destinationZone,
      civilDawn: civilDawn ? formatInstantInZone(civilDawn, destinationZone) : null,
      sunrise: sunrise ? formatInstantInZone(sunrise, destinationZone) : null,
    },
    loadingStart: formatInstantInZone(loadingStart, originZone),
    departure: formatInstantInZone(departure, originZone),
    arrival: formatInstantInZone(arrival, destinationZone),
    distanceKm,
    driveMinutes,
    restMinutes: schedule.restMinutes,
    arrivesBeforeDawn,
    latestDepartureForDawn: latestDeparture
      ? formatInstantInZone(latestDeparture, originZone)
      : null,
    legs,
    notes,
  };
}

/**
 * IANA time zones: the zone at a point (geo-tz, boundaries since 1970) and instants written in a
 * zone's local time with its offset, using the runtime's Intl time-zone data (no extra packages).
 */
import { find } from 'geo-tz';
import { parseCalendarDate } from './calendar-date';
import { assertLatLon } from './guards';

/** IANA time zone at a point, e.g. America/North_Dakota/Beulah (geo-tz's 1970 data set). */
export function timeZoneAt(lat: number, lon: number): string {
  assertLatLon('point', lat, lon);
  const zones = find(lat, lon);
  if (zones.length === 0) throw new RangeError(`no time zone found at ${lat}, ${lon}`);
  return zones[0];
}

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(timeZone: string): Intl.DateTimeFormat {
  let formatter = formatters.get(timeZone);
  if (!formatter) {
    try {
      formatter = new Intl.DateTimeFormat('en-US', {
        timeZone,
        hourCycle: 'h23',
        year: 'numeric',
        month: '2-digit',
        day: '2-digit',
        hour: '2-digit',
        minute: '2-digit',
        second: '2-digit',
        era: 'short',
      });
    } catch {
      throw new RangeError(`unknown IANA time zone ${JSON.stringify(timeZone)}`);
    }
    formatters.set(timeZone, formatter);
  }
  return formatter;
}

interface WallClock {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  second: number;
}

function wallClockOf(instantMs: number, timeZone: string): WallClock {
  const parts: Record<string, string> = {};
  for (const part of formatterFor(timeZone).formatToParts(new Date(instantMs))) {
    parts[part.type] = part.value;
  }
  const year = parts.era === 'BC' ? 1 - Number(parts.year) : Number(parts.year);
  return {
    year,
    month: Number(parts.month),
    day: Number(parts.day),
    hour: Number(parts.hour),
    minute: Number(parts.minute),
    second: Number(parts.second),
  };
}

/** Offset of `timeZone` from UTC at an instant, in whole minutes (e.g. −480 for PST). */
export function zoneOffsetMinutes(instant: Date, timeZone: string): number {
  const ms = Math.floor(instant.getTime() / 1000) * 1000;
  const w = wallClockOf(ms, timeZone);
  const asUtc = Date.UTC(w.year, w.month - 1, w.day, w.hour, w.minute, w.second);
  return Math.round((asUtc - ms) / 60_000);
}

/**
 * The instant when clocks in `timeZone` show `localDate` at hours:minutes. Like Temporal's
 * 'compatible' disambiguation: in a fall-back overlap the earlier instant, in a spring-forward gap
 * the wall time read with the offset before the gap (so 02:30 becomes 03:30).
 */
export function zonedWallTimeToInstant(
  localDate: string,
  hours: number,
  minutes: number,
  timeZone: string,
): Date {
  const { year, month, day } = parseCalendarDate(localDate);
  const asUtc = Date.UTC(year, month - 1, day, hours, minutes);
  const offsetBefore = zoneOffsetMinutes(new Date(asUtc - 14 * 3_600_000), timeZone) * 60_000;
  const offsetAfter = zoneOffsetMinutes(new Date(asUtc + 14 * 3_600_000), timeZone) * 60_000;
  const valid = [asUtc - offsetBefore, asUtc - offsetAfter].filter(
    (candidate) => zoneOffsetMinutes(new Date(candidate), timeZone) * 60_000 === asUtc - candidate,
  );
  return new Date(valid.length > 0 ? Math.min(...valid) : asUtc - offsetBefore);
}

/** The 'YYYY-MM-DD' local date in `timeZone` at an instant. */
export function localDateAt(instant: Date, timeZone: string): string {
  const w = wallClockOf(instant.getTime(), timeZone);
  return `${pad(w.year, 4)}-${pad(w.month)}-${pad(w.day)}`;
}

function pad(value: number, width = 2): string {
  return String(value).padStart(width, '0');
}

/**
 * ISO 8601 text of an instant in a zone's local time with its offset, rounded to the second,
 * e.g. 2026-01-28T17:45:00-08:00 (UTC is written +00:00).
 */
export function formatInstantInZone(instant: Date, timeZone: string): string {
  const ms = instant.getTime();
  if (!Number.isFinite(ms)) throw new RangeError(`cannot format an invalid date in ${timeZone}`);
  const rounded = Math.round(ms / 1000) * 1000;
  const w = wallClockOf(rounded, timeZone);
  const offset = zoneOffsetMinutes(new Date(rounded), timeZone);
  const sign = offset < 0 ? '-' : '+';
  const abs = Math.abs(offset);
  return (
    `${pad(w.year, 4)}-${pad(w.month)}-${pad(w.day)}T${pad(w.hour)}:${pad(w.minute)}:${pad(w.second)}` +
    `${sign}${pad(Math.floor(abs / 60))}:${pad(abs % 60)}`
  );
}

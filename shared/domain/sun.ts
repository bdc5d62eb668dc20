/**
 * Sunrise, sunset and civil twilight for a place and a local date (suncalc, Meeus-based).
 *
 * Definitions (US Naval Observatory; NOAA solar calculator): sunrise and sunset when the Sun's
 * centre is 0.833° below the horizon, civil dawn and dusk when it is 6° below.
 * suncalc 2 computes the events of the solar day nearest to the instant it is given, so we pass the
 * requested local date's noon (in the place's own time zone) as that instant.
 */
import { getTimes } from 'suncalc';
import { addDays, parseCalendarDate } from './calendar-date';
import { assertLatLon } from './guards';
import { localDateAt, zonedWallTimeToInstant } from './time-zones';

/** Sun events of one local date at one place; null where the Sun does not reach the altitude. */
export interface SunEvents {
  /** The local date asked for. */
  localDate: string;
  /** IANA zone of the place. */
  timeZone: string;
  /** Sun's centre 6° below the horizon, morning. */
  civilDawn: Date | null;
  /** Upper limb on the horizon, morning (centre at −0.833°). */
  sunrise: Date | null;
  /** Sun highest. */
  solarNoon: Date;
  /** Upper limb on the horizon, evening. */
  sunset: Date | null;
  /** Sun's centre 6° below the horizon, evening. */
  civilDusk: Date | null;
  /** Why an event is missing (white nights, polar day or night). */
  notes: string[];
}

/** Sunrise, sunset, civil dawn and dusk of the solar day whose noon falls on `localDate`. */
export function sunEventsAt(
  lat: number,
  lon: number,
  localDate: string,
  timeZone: string,
): SunEvents {
  assertLatLon('place', lat, lon);
  parseCalendarDate(localDate);
  const localNoon = zonedWallTimeToInstant(localDate, 12, 0, timeZone);
  const times = getTimes(localNoon, lat, lon);
  const notes: string[] = [];
  const where = `${lat.toFixed(3)}, ${lon.toFixed(3)} on ${localDate}`;
  if (times.sunrise === null) {
    notes.push(
      times.alwaysUp
        ? `The Sun stays above the horizon all day at ${where} (polar day): no sunrise or sunset.`
        : `The Sun stays below the horizon all day at ${where} (polar night): no sunrise or sunset.`,
    );
  }
  if (times.dusk === null || times.dawn === null) {
    const highNoon = times.sunrise !== null || times.alwaysUp;
    notes.push(
      highNoon
        ? `The Sun does not go 6° below the horizon at ${where}: no civil dusk or dawn (it stays light enough for bees to fly all night).`
        : `The Sun does not rise to 6° below the horizon at ${where}: no civil dawn or dusk.`,
    );
  }
  return {
    localDate,
    timeZone,
    civilDawn: times.dawn,
    sunrise: times.sunrise,
    solarNoon: times.solarNoon,
    sunset: times.sunset,
    civilDusk: times.dusk,
    notes,
  };
}

/** Civil dusk (Sun 6° below the horizon, evening) at a place on a local date, or null. */
export function civilDuskAt(
  lat: number,
  lon: number,
  localDate: string,
  timeZone: string,
): Date | null {
  return sunEventsAt(lat, lon, localDate, timeZone).civilDusk;
}

/** Civil dawn (Sun 6° below the horizon, morning) at a place on a local date, or null. */
export function civilDawnAt(
  lat: number,
  lon: number,
  localDate: string,
  timeZone: string,
): Date | null {
  return sunEventsAt(lat, lon, localDate, timeZone).civilDawn;
}

/** The first morning event (civil dawn or sunrise) strictly after `after`, within `maxDays` days. */
export function firstMorningEventAfter(
  lat: number,
  lon: number,
  after: Date,
  timeZone: string,
  event: 'civilDawn' | 'sunrise',
  maxDays = 3,
): Date | null {
  const startDate = localDateAt(after, timeZone);
  for (let offset = 0; offset <= maxDays; offset++) {
    const time = sunEventsAt(lat, lon, addDays(startDate, offset), timeZone)[event];
    if (time !== null && time.getTime() > after.getTime()) return time;
  }
  return null;
}

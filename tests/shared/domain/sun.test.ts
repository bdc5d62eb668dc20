import { Body, Observer, SearchAltitude, SearchRiseSet } from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { sunEventsAt } from '../../../shared/domain/sun';
import { formatInstantInZone } from '../../../shared/domain/time-zones';

const MINUTE = 60_000;

/** Minutes after local midnight of an ISO 8601 string's wall time. */
function wallMinutes(iso: string): number {
  const [h, m, s] = iso.slice(11, 19).split(':').map(Number);
  return h * 60 + m + s / 60;
}

describe('sunEventsAt vs USNO', () => {
  // USNO "Rise and Set for the Sun for 2008", 37°24′N 121°55′W, zone UTC−8 (REFERENCES.md), ±2 min.
  it.each([
    ['2008-01-01', '07:22', '17:00'],
    ['2008-02-01', '07:11', '17:32'],
    ['2008-03-01', '06:38', '18:02'],
    ['2008-06-01', '04:48', '19:23'],
    ['2008-12-01', '07:04', '16:50'],
  ])(
    'when %s at 37°24′N 121°55′W then rise %s and set %s within 2 min (USNO 2008 table)',
    (date, rise, set) => {
      const events = sunEventsAt(37.4, -(121 + 55 / 60), date, 'Etc/GMT+8');
      const toMinutes = (hhmm: string) => Number(hhmm.slice(0, 2)) * 60 + Number(hhmm.slice(3));
      const sunrise = formatInstantInZone(events.sunrise!, 'Etc/GMT+8');
      const sunset = formatInstantInZone(events.sunset!, 'Etc/GMT+8');
      expect(sunrise.slice(0, 10)).toBe(date);
      expect(Math.abs(wallMinutes(sunrise) - toMinutes(rise))).toBeLessThanOrEqual(2);
      expect(Math.abs(wallMinutes(sunset) - toMinutes(set))).toBeLessThanOrEqual(2);
    },
  );
});

describe('sunEventsAt vs astronomy-engine', () => {
  // astronomy-engine: independent ephemeris (REFERENCES.md); agreement within 2 minutes.
  const places: [string, number, number, string, string][] = [
    ['Modesto, CA', 37.64, -120.99, 'America/Los_Angeles', '2026-01-28'],
    ['Wenatchee, WA', 47.42, -120.31, 'America/Los_Angeles', '2026-04-15'],
    ['Beulah, ND', 47.26, -101.78, 'America/North_Dakota/Beulah', '2026-06-21'],
    ['south Texas, clocks spring forward', 28.0, -97.9, 'America/Chicago', '2026-03-08'],
    ['Modesto, clocks fall back', 37.64, -120.99, 'America/Los_Angeles', '2026-11-01'],
    ['Phoenix (no daylight time)', 33.45, -112.07, 'America/Phoenix', '2026-07-01'],
    ['Mildura, Australia', -34.2, 142.15, 'Australia/Melbourne', '2026-08-01'],
    ['Christchurch, New Zealand', -43.5, 172.6, 'Pacific/Auckland', '2026-12-21'],
    ['Santiago, Chile', -33.45, -70.67, 'America/Santiago', '2026-09-15'],
  ];

  it.each(places)(
    'when at %s then sunrise, sunset, civil dawn and dusk agree within 2 min',
    (_name, lat, lon, zone, date) => {
      const events = sunEventsAt(lat, lon, date, zone);
      const observer = new Observer(lat, lon, 0);
      const before = new Date(events.solarNoon.getTime() - 12 * 60 * MINUTE);
      const noon = events.solarNoon;
      const rise = SearchRiseSet(Body.Sun, observer, +1, before, 1)!.date;
      const set = SearchRiseSet(Body.Sun, observer, -1, noon, 1)!.date;
      const dawn = SearchAltitude(Body.Sun, observer, +1, before, 1, -6)!.date;
      const dusk = SearchAltitude(Body.Sun, observer, -1, noon, 1, -6)!.date;
      expect(Math.abs(events.sunrise!.getTime() - rise.getTime())).toBeLessThanOrEqual(2 * MINUTE);
      expect(Math.abs(events.sunset!.getTime() - set.getTime())).toBeLessThanOrEqual(2 * MINUTE);
      expect(Math.abs(events.civilDawn!.getTime() - dawn.getTime())).toBeLessThanOrEqual(
        2 * MINUTE,
      );
      expect(Math.abs(events.civilDusk!.getTime() - dusk.getTime())).toBeLessThanOrEqual(
        2 * MINUTE,
      );
      // The events belong to the requested local date.
      expect(formatInstantInZone(events.sunrise!, zone).slice(0, 10)).toBe(date);
      expect(formatInstantInZone(events.sunset!, zone).slice(0, 10)).toBe(date);
    },
  );

  it('when clocks spring forward in Texas (2026-03-08) then sunrise is written at −05:00 and the previous sunset at −06:00', () => {
    const saturday = sunEventsAt(28.0, -97.9, '2026-03-07', 'America/Chicago');
    const sunday = sunEventsAt(28.0, -97.9, '2026-03-08', 'America/Chicago');
    expect(formatInstantInZone(saturday.sunset!, 'America/Chicago')).toMatch(/-06:00$/);
    expect(formatInstantInZone(sunday.sunrise!, 'America/Chicago')).toMatch(/-05:00$/);
    // The clocks jump an hour, the Sun does not: sunrise moves about an hour later on the clock.
    const shift =
      wallMinutes(formatInstantInZone(sunday.sunrise!, 'America/Chicago')) -
      wallMinutes(formatInstantInZone(saturday.sunrise!, 'America/Chicago'));
    expect(shift).toBeGreaterThan(57);
    expect(shift).toBeLessThan(60);
  });

  it('when in Phoenix (no daylight time) then the offset stays −07:00 in March and July', () => {
    for (const date of ['2026-03-08', '2026-07-01', '2026-11-01']) {
      const events = sunEventsAt(33.45, -112.07, date, 'America/Phoenix');
      expect(formatInstantInZone(events.sunset!, 'America/Phoenix')).toMatch(/-07:00$/);
    }
  });
});

describe('sunEventsAt without civil twilight', () => {
  it('when at 65°N in late June then civil dusk and dawn are null with a note, not an error (REFERENCES.md)', () => {
    const events = sunEventsAt(65, -147.7, '2026-06-21', 'America/Anchorage');
    expect(events.civilDusk).toBeNull();
    expect(events.civilDawn).toBeNull();
    expect(events.sunset).not.toBeNull();
    expect(events.notes.join(' ')).toMatch(/6° below the horizon/);
    // astronomy-engine agrees: the Sun does not reach −6° within the day.
    const observer = new Observer(65, -147.7, 0);
    expect(SearchAltitude(Body.Sun, observer, -1, events.solarNoon, 1, -6)).toBeNull();
  });

  it('when at 78°N in June (polar day) then sunrise and sunset are null with a note', () => {
    const events = sunEventsAt(78.2, 15.6, '2026-06-21', 'Arctic/Longyearbyen');
    expect(events.sunrise).toBeNull();
    expect(events.notes.join(' ')).toMatch(/polar day/);
  });

  it('when a date does not exist then throws', () => {
    expect(() => sunEventsAt(37, -120, '2026-02-30', 'America/Los_Angeles')).toThrow(/2026-02-30/);
  });
});

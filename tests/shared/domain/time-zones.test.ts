import { describe, expect, it } from 'vitest';
import {
  formatInstantInZone,
  localDateAt,
  timeZoneAt,
  zonedWallTimeToInstant,
  zoneOffsetMinutes,
} from '../../../shared/domain/time-zones';

describe('timeZoneAt (geo-tz, 1970 data set)', () => {
  it.each([
    ['Mercer County, ND (Beulah)', 47.26, -101.78, 'America/North_Dakota/Beulah'],
    ['Modesto, CA', 37.64, -120.99, 'America/Los_Angeles'],
    ['Wenatchee, WA', 47.42, -120.31, 'America/Los_Angeles'],
    ['south Texas', 28.0, -97.9, 'America/Chicago'],
    ['Phoenix, AZ', 33.45, -112.07, 'America/Phoenix'],
    ['Bismarck, ND', 46.81, -100.78, 'America/Chicago'],
  ])('when at %s then the zone is %s', (_name, lat, lon, zone) => {
    expect(timeZoneAt(lat, lon)).toBe(zone);
  });

  it('when the latitude is out of range then throws naming it', () => {
    expect(() => timeZoneAt(91, 0)).toThrow(/latitude.*91/);
  });
});

describe('formatInstantInZone', () => {
  it('when 2026-01-29T01:45Z is written for Los Angeles then it reads 17:45 at −08:00', () => {
    expect(formatInstantInZone(new Date('2026-01-29T01:45:00Z'), 'America/Los_Angeles')).toBe(
      '2026-01-28T17:45:00-08:00',
    );
  });

  it('when written in UTC or a half-hour zone then the offset is +00:00 or +05:30', () => {
    expect(formatInstantInZone(new Date('2026-07-01T12:00:00Z'), 'UTC')).toBe(
      '2026-07-01T12:00:00+00:00',
    );
    expect(formatInstantInZone(new Date('2026-07-01T12:00:00Z'), 'Asia/Kolkata')).toBe(
      '2026-07-01T17:30:00+05:30',
    );
  });

  it('when parsed back then the instant is unchanged (to the second)', () => {
    const instant = new Date('2026-11-01T08:30:00Z');
    expect(Date.parse(formatInstantInZone(instant, 'America/Chicago'))).toBe(instant.getTime());
  });
});

describe('zonedWallTimeToInstant', () => {
  it('when noon in Chicago on the spring-forward day then it is 17:00Z (CDT)', () => {
    expect(zonedWallTimeToInstant('2026-03-08', 12, 0, 'America/Chicago').toISOString()).toBe(
      '2026-03-08T17:00:00.000Z',
    );
  });

  it('when 02:30 does not exist (spring forward) then it becomes 03:30 CDT', () => {
    expect(
      formatInstantInZone(
        zonedWallTimeToInstant('2026-03-08', 2, 30, 'America/Chicago'),
        'America/Chicago',
      ),
    ).toBe('2026-03-08T03:30:00-05:00');
  });

  it('when 01:30 happens twice (fall back) then the earlier (CDT) is returned', () => {
    expect(zonedWallTimeToInstant('2026-11-01', 1, 30, 'America/Chicago').toISOString()).toBe(
      '2026-11-01T06:30:00.000Z',
    );
  });

  it('when asking the local date and offset then they follow the zone', () => {
    expect(localDateAt(new Date('2026-01-29T03:00:00Z'), 'America/Los_Angeles')).toBe('2026-01-28');
    expect(zoneOffsetMinutes(new Date('2026-07-01T00:00:00Z'), 'America/Los_Angeles')).toBe(-420);
  });
});

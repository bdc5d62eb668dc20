import * as geographiclib from 'geographiclib-geodesic';
import { Body, Observer, SearchAltitude } from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { computeMoveWindow } from '../../../shared/domain/move-window';

const MINUTE = 60_000;
const texas = { lat: 28.0, lon: -97.9 };
const sanJoaquin = { lat: 36.6, lon: -120.3 };
const ms = (iso: string) => Date.parse(iso);

describe('computeMoveWindow: south Texas → San Joaquin Valley (worked move)', () => {
  const base = {
    origin: texas,
    destination: sanJoaquin,
    date: '2026-01-20',
    loadingMinutes: 120,
    averageSpeedKmh: 80,
  };

  it('when one driver hauls then it takes several nights with 10-hour rests (49 CFR 395.3)', () => {
    const move = computeMoveWindow({ ...base, drivers: 1 });
    expect(move.origin.timeZone).toBe('America/Chicago');
    expect(move.destination.timeZone).toBe('America/Los_Angeles');
    expect(move.origin.civilDusk).toMatch(/^2026-01-20T18:\d\d:\d\d-06:00$/);
    expect(move.loadingStart).toBe(move.origin.civilDusk);
    expect(ms(move.departure) - ms(move.loadingStart)).toBe(120 * MINUTE);
    const rests = move.legs.filter((l) => l.kind === 'rest');
    expect(rests.length).toBeGreaterThanOrEqual(2);
    expect(rests.every((l) => l.minutes === 600)).toBe(true);
    expect(move.restMinutes).toBe(rests.length * 600);
    expect(move.legs.filter((l) => l.kind === 'drive').every((l) => l.minutes <= 660)).toBe(true);
    expect(ms(move.arrival) - ms(move.departure)).toBeCloseTo(
      (move.driveMinutes + move.restMinutes) * MINUTE,
      -3,
    );
    expect(move.arrival).toMatch(/-08:00$/);
    expect(move.arrivesBeforeDawn).toBe(false);
  });

  it('when a team hauls then it drives straight through and arrives a day and a half sooner', () => {
    const solo = computeMoveWindow({ ...base, drivers: 1 });
    const team = computeMoveWindow({ ...base, drivers: 2 });
    expect(team.restMinutes).toBe(0);
    expect(new Set(team.legs.map((l) => l.driver))).toEqual(new Set([1, 2]));
    expect(ms(team.arrival) - ms(team.departure)).toBeCloseTo(team.driveMinutes * MINUTE, -3);
    expect(ms(solo.arrival) - ms(team.arrival)).toBe(solo.restMinutes * MINUTE);
  });

  it('when distance is great circle × 1.25 then it is within 0.5 % of GeographicLib × 1.25, and driveMinutes = distance ÷ speed', () => {
    const move = computeMoveWindow(base);
    const geodesicKm =
      geographiclib.Geodesic.WGS84.Inverse(texas.lat, texas.lon, sanJoaquin.lat, sanJoaquin.lon)
        .s12! / 1000;
    expect(Math.abs(move.distanceKm / 1.25 - geodesicKm) / geodesicKm).toBeLessThan(0.005);
    expect(move.driveMinutes).toBeCloseTo((move.distanceKm / 80) * 60, 9);
    expect(move.legs.reduce((s, l) => s + (l.distanceKm ?? 0), 0)).toBeCloseTo(move.distanceKm, 6);
  });

  it('when latestDepartureForDawn is computed then departing then arrives exactly at that civil dawn', () => {
    const move = computeMoveWindow({ ...base, drivers: 2 });
    const haul = ms(move.arrival) - ms(move.departure);
    expect(ms(move.latestDepartureForDawn!) + haul).toBeCloseTo(
      ms(move.destination.civilDawn!),
      -4,
    );
    expect(ms(move.destination.civilDawn!)).toBeGreaterThan(ms(move.departure));
  });

  it('when the destination dawn is checked against astronomy-engine then it agrees within 2 min', () => {
    const move = computeMoveWindow(base);
    const dawn = SearchAltitude(
      Body.Sun,
      new Observer(sanJoaquin.lat, sanJoaquin.lon, 0),
      +1,
      new Date(ms(move.departure)),
      2,
      -6,
    )!;
    expect(Math.abs(ms(move.destination.civilDawn!) - dawn.date.getTime())).toBeLessThanOrEqual(
      2 * MINUTE,
    );
  });
});

describe('computeMoveWindow: short moves and edge cases', () => {
  it('when a short night move in the valley then it arrives before dawn and the latest departure is later than the actual one', () => {
    const move = computeMoveWindow({
      origin: { lat: 36.6, lon: -120.3 },
      destination: { lat: 37.64, lon: -120.99 },
      date: '2026-02-10',
      loadingMinutes: 90,
      averageSpeedKmh: 70,
    });
    expect(move.arrivesBeforeDawn).toBe(true);
    expect(move.restMinutes).toBe(0);
    expect(ms(move.latestDepartureForDawn!)).toBeGreaterThan(ms(move.departure));
  });

  it('when the night clocks spring forward (US 2026-03-08) then departure is −08:00 and dawn −07:00, and durations are real minutes', () => {
    const move = computeMoveWindow({
      origin: { lat: 36.6, lon: -120.3 },
      destination: { lat: 47.42, lon: -120.31 },
      date: '2026-03-07',
      loadingMinutes: 60,
      averageSpeedKmh: 80,
      drivers: 2,
    });
    expect(move.departure).toMatch(/-08:00$/);
    expect(move.destination.civilDawn).toMatch(/^2026-03-08T\d\d:\d\d:\d\d-07:00$/);
    expect(ms(move.arrival) - ms(move.departure)).toBeCloseTo(move.driveMinutes * MINUTE, -3);
  });

  it('when a routed distance and a later loading start are given then they are used', () => {
    const move = computeMoveWindow({
      origin: texas,
      destination: { lat: 29.4, lon: -98.5 },
      date: '2026-11-01',
      loadingMinutes: 60,
      averageSpeedKmh: 90,
      distanceKm: 180,
      loadingStart: '2026-11-01T21:00:00-06:00',
    });
    expect(move.distanceKm).toBe(180);
    expect(move.driveMinutes).toBe(120);
    expect(move.loadingStart).toBe('2026-11-01T21:00:00-06:00');
    expect(move.departure).toBe('2026-11-01T22:00:00-06:00');
    expect(move.arrival).toBe('2026-11-02T00:00:00-06:00');
  });

  it('when loading at 65°N in late June then civil dusk is null with a note and loading starts at sunset', () => {
    const move = computeMoveWindow({
      origin: { lat: 65, lon: -147.7 },
      destination: { lat: 64.8, lon: -147.5 },
      date: '2026-06-21',
      loadingMinutes: 60,
      averageSpeedKmh: 60,
    });
    expect(move.origin.civilDusk).toBeNull();
    expect(move.loadingStart).toBe(move.origin.sunset);
    expect(move.destination.civilDawn).toBeNull();
    expect(move.arrivesBeforeDawn).toBeNull();
    expect(move.latestDepartureForDawn).toBeNull();
    expect(move.notes.join(' ')).toMatch(/civil dusk/);
  });

  it('when the latitude is out of range or speed is 0 then throws naming the field', () => {
    const good = {
      origin: texas,
      destination: sanJoaquin,
      date: '2026-01-20',
      loadingMinutes: 60,
      averageSpeedKmh: 80,
    };
    expect(() => computeMoveWindow({ ...good, origin: { lat: 95, lon: 0 } })).toThrow(
      /origin latitude.*95/,
    );
    expect(() => computeMoveWindow({ ...good, averageSpeedKmh: 0 })).toThrow(/averageSpeedKmh/);
    expect(() => computeMoveWindow({ ...good, date: '2026-02-30' })).toThrow(/2026-02-30/);
  });
});

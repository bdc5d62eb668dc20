import { describe, expect, it } from 'vitest';
import { scheduleHaul, type HaulLeg } from '../../../shared/domain/hours-of-service';

const H = 3_600_000;
const start = Date.UTC(2026, 0, 21, 0, 0);
const drives = (legs: HaulLeg[]) => legs.filter((l) => l.kind === 'drive');
const rests = (legs: HaulLeg[]) => legs.filter((l) => l.kind === 'rest');

describe('scheduleHaul (49 CFR 395.3)', () => {
  it('when one driver drives 30 h after 2 h loading then each shift drives ≤ 11 h and rests are 10 h off (395.3(a)(1),(3))', () => {
    const s = scheduleHaul({
      onDutyStartMs: start,
      departureMs: start + 2 * H,
      driveMinutes: 30 * 60,
      averageSpeedKmh: 80,
      drivers: 1,
    });
    expect(drives(s.legs).map((l) => l.minutes)).toEqual([660, 660, 480]);
    expect(rests(s.legs).map((l) => l.minutes)).toEqual([600, 600]);
    expect(s.restMinutes).toBe(1200);
    expect(s.arrivalMs).toBe(start + 2 * H + (30 + 20) * H);
  });

  it('when loading takes 5 h then the first shift stops at the 14th hour on duty, after 9 h driving (395.3(a)(2), loading on duty)', () => {
    const s = scheduleHaul({
      onDutyStartMs: start,
      departureMs: start + 5 * H,
      driveMinutes: 20 * 60,
      averageSpeedKmh: 80,
      drivers: 1,
    });
    const first = drives(s.legs)[0];
    expect(first.minutes).toBe(9 * 60);
    expect(first.endMs).toBe(start + 14 * H);
  });

  it('when bees are aboard then 11 h are driven without the 30-minute break (FMCSA exemption, 80 FR 35425, 2015)', () => {
    const s = scheduleHaul({
      onDutyStartMs: start,
      departureMs: start + H,
      driveMinutes: 11 * 60,
      averageSpeedKmh: 80,
      drivers: 1,
    });
    expect(s.legs).toHaveLength(1);
    expect(s.legs[0]).toMatchObject({ kind: 'drive', minutes: 660 });
  });

  it('when no bees are aboard then a 30-minute break follows 8 h of driving (395.3(a)(3)(ii))', () => {
    const s = scheduleHaul({
      onDutyStartMs: start,
      departureMs: start + H,
      driveMinutes: 11 * 60,
      averageSpeedKmh: 80,
      drivers: 1,
      beesAboard: false,
    });
    expect(s.legs.map((l) => [l.kind, l.minutes])).toEqual([
      ['drive', 480],
      ['rest', 30],
      ['drive', 180],
    ]);
  });

  it('when a team drives 36 h then the load keeps moving: no rest, drivers alternate, each stint ≤ 11 h', () => {
    const s = scheduleHaul({
      onDutyStartMs: start,
      departureMs: start + 2 * H,
      driveMinutes: 36 * 60,
      averageSpeedKmh: 80,
      drivers: 2,
    });
    expect(s.restMinutes).toBe(0);
    const d = drives(s.legs);
    expect(d.map((l) => l.driver)).toEqual([1, 2, 1, 2]);
    expect(Math.max(...d.map((l) => l.minutes))).toBeLessThanOrEqual(660);
    expect(s.arrivalMs).toBe(start + 38 * H);
    expect(s.drivingMinutesByDriver).toEqual([22 * 60 - 0, 14 * 60]);
  });

  it('when a team faces a 14-hour loading day then driver 2 drives first and driver 1 resets meanwhile', () => {
    const s = scheduleHaul({
      onDutyStartMs: start,
      departureMs: start + 14 * H,
      driveMinutes: 15 * 60,
      averageSpeedKmh: 80,
      drivers: 2,
    });
    expect(drives(s.legs).map((l) => [l.driver, l.minutes])).toEqual([
      [2, 660],
      [1, 240],
    ]);
    expect(s.restMinutes).toBe(0);
  });

  it('when the drivers count is not 1 or 2 then throws naming it', () => {
    expect(() =>
      scheduleHaul({
        onDutyStartMs: 0,
        departureMs: 0,
        driveMinutes: 1,
        averageSpeedKmh: 80,
        drivers: 3,
      }),
    ).toThrow(/drivers.*3/);
  });
});

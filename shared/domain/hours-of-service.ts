/**
 * US hours-of-service for property-carrying drivers (49 CFR 395.3), applied to a bee haul.
 *
 * Model (docs/calculations.md):
 * - Every driver starts the evening after at least 10 consecutive hours off duty.
 * - Loading counts as on-duty time of driver 1 (the driver runs or helps the loader), so it opens
 *   driver 1's 14-hour window; a second driver rests in the sleeper berth until first at the wheel.
 * - A driver may drive up to 11 hours, and not after the 14th hour since coming on duty; then
 *   10 consecutive hours off reset both counters (395.3(a)(1)–(3)).
 * - The 30-minute break after 8 hours of driving (395.3(a)(3)(ii)) does not apply while bees are
 *   aboard (FMCSA exemption, 80 FR 35425, June 2015, later written into the rule). It is applied
 *   only when `beesAboard` is false.
 * - The driver at the wheel keeps driving until a limit stops them; then the other driver, if any,
 *   takes over; when nobody may drive the truck stands (a rest leg) until the first driver can.
 *   A team therefore keeps the load moving: each stint of ≥ 10 h gives the other driver a reset.
 * - Not modelled: the 60/70-hour week (a note is given past 60 h), split sleeper-berth periods,
 *   the adverse-driving extension, short-haul exceptions.
 */
import { assertInRange, assertInteger } from './guards';

/** Most driving after 10 hours off, minutes (49 CFR 395.3(a)(3)). */
export const MAX_DRIVING_MINUTES = 11 * 60;
/** No driving after this many minutes since coming on duty (49 CFR 395.3(a)(2)). */
export const DUTY_WINDOW_MINUTES = 14 * 60;
/** Consecutive off-duty minutes that reset the driving and window limits (49 CFR 395.3(a)(1)). */
export const RESET_OFF_DUTY_MINUTES = 10 * 60;
/** Driving minutes after which a 30-minute break is due (49 CFR 395.3(a)(3)(ii)). */
export const BREAK_AFTER_DRIVING_MINUTES = 8 * 60;
/** Length of that break, minutes. */
export const BREAK_MINUTES = 30;
/** Weekly on-duty figure past which a note is given (60 hours in 7 days, 49 CFR 395.3(b)). */
export const WEEKLY_NOTE_MINUTES = 60 * 60;

const MINUTE_MS = 60_000;
const EPSILON_MINUTES = 1e-9;

/** One piece of the haul: driving (with the driver at the wheel) or standing still. */
export interface HaulLeg {
  /** 'drive' or 'rest'. */
  kind: 'drive' | 'rest';
  /** Start instant, ms since epoch. */
  startMs: number;
  /** End instant, ms since epoch. */
  endMs: number;
  /** Length, minutes. */
  minutes: number;
  /** Distance covered, km (drive legs). */
  distanceKm?: number;
  /** Driver at the wheel, 1 or 2 (drive legs). */
  driver?: number;
}

/** Input of scheduleHaul. */
export interface HaulScheduleInput {
  /** When driver 1 came on duty (start of loading), ms since epoch. */
  onDutyStartMs: number;
  /** When the truck rolls (end of loading), ms since epoch. */
  departureMs: number;
  /** Total driving needed, minutes. */
  driveMinutes: number;
  /** Average speed, km/h (for each leg's distance). */
  averageSpeedKmh: number;
  /** Number of drivers, 1 or 2. */
  drivers: number;
  /** Bees aboard: the 30-minute break does not apply (default true). */
  beesAboard?: boolean;
}

/** Result of scheduleHaul. */
export interface HaulSchedule {
  /** Drive and rest legs in order. */
  legs: HaulLeg[];
  /** End of the last drive leg, ms since epoch. */
  arrivalMs: number;
  /** Sum of rest legs, minutes. */
  restMinutes: number;
  /** Driving per driver, minutes. */
  drivingMinutesByDriver: number[];
}

interface DriverState {
  windowStartMs: number | null;
  drivenMinutes: number;
  sinceBreakMinutes: number;
  offSinceMs: number;
  totalDrivingMinutes: number;
}

/** Lays out driving and the rests the rules force, for one driver or a team of two. */
export function scheduleHaul(input: HaulScheduleInput): HaulSchedule {
  const { onDutyStartMs, departureMs, driveMinutes, averageSpeedKmh, drivers } = input;
  const beesAboard = input.beesAboard ?? true;
  assertInteger('drivers', drivers, 1, 2);
  assertInRange('driveMinutes', driveMinutes, 0);
  assertInRange('averageSpeedKmh', averageSpeedKmh, Number.MIN_VALUE);
  assertInRange('departureMs − onDutyStartMs', departureMs - onDutyStartMs, 0);

  const team: DriverState[] = Array.from({ length: drivers }, (_, i) => ({
    windowStartMs: i === 0 ? onDutyStartMs : null,
    drivenMinutes: 0,
    sinceBreakMinutes: 0,
    offSinceMs: i === 0 ? departureMs : -Infinity,
    totalDrivingMinutes: 0,
  }));
  const legs: HaulLeg[] = [];
  let t = departureMs;
  let remaining = driveMinutes;
  let current = 0;

  const refresh = (d: DriverState): void => {
    const offMinutes = (t - d.offSinceMs) / MINUTE_MS;
    if (offMinutes >= RESET_OFF_DUTY_MINUTES) {
      d.windowStartMs = null;
      d.drivenMinutes = 0;
      d.sinceBreakMinutes = 0;
    } else if (offMinutes >= BREAK_MINUTES) {
      d.sinceBreakMinutes = 0;
    }
  };
  // Driving left before the 11- or 14-hour limit, ignoring the 30-minute break.
  const shiftLeft = (d: DriverState): number => {
    if (d.windowStartMs === null) return MAX_DRIVING_MINUTES;
    const windowLeft = DUTY_WINDOW_MINUTES - (t - d.windowStartMs) / MINUTE_MS;
    return Math.min(MAX_DRIVING_MINUTES - d.drivenMinutes, windowLeft);
  };
  const available = (d: DriverState): number => {
    const breakLimit = beesAboard ? Infinity : BREAK_AFTER_DRIVING_MINUTES - d.sinceBreakMinutes;
    return Math.min(shiftLeft(d), breakLimit);
  };
  // After refresh(), a driver who may not drive needs either a 10-hour reset or a 30-minute
  // break counted from when they stopped; both lie strictly after t.
  const canDriveAgainAt = (d: DriverState): number => {
    const offMinutes = shiftLeft(d) <= EPSILON_MINUTES ? RESET_OFF_DUTY_MINUTES : BREAK_MINUTES;
    return d.offSinceMs + offMinutes * MINUTE_MS;
  };

  while (remaining > EPSILON_MINUTES) {
    team.forEach(refresh);
    let chosen = available(team[current]) > EPSILON_MINUTES ? current : -1;
    if (chosen < 0) {
      let best = EPSILON_MINUTES;
      team.forEach((d, i) => {
        const minutes = available(d);
        if (i !== current && minutes > best) {
          best = minutes;
          chosen = i;
        }
      });
    }
    if (chosen < 0) {
      const resumeMs = Math.min(...team.map(canDriveAgainAt));
      const minutes = (resumeMs - t) / MINUTE_MS;
      legs.push({ kind: 'rest', startMs: t, endMs: resumeMs, minutes });
      t = resumeMs;
      continue;
    }
    const driver = team[chosen];
    const minutes = Math.min(available(driver), remaining);
    if (driver.windowStartMs === null) driver.windowStartMs = t;
    const endMs = t + minutes * MINUTE_MS;
    const previous = legs[legs.length - 1];
    if (previous?.kind === 'drive' && previous.driver === chosen + 1) {
      previous.endMs = endMs;
      previous.minutes += minutes;
      previous.distanceKm = (previous.minutes / 60) * averageSpeedKmh;
    } else {
      legs.push({
        kind: 'drive',
        startMs: t,
        endMs,
        minutes,
        distanceKm: (minutes / 60) * averageSpeedKmh,
        driver: chosen + 1,
      });
    }
    driver.drivenMinutes += minutes;
    driver.sinceBreakMinutes += minutes;
    driver.totalDrivingMinutes += minutes;
    remaining -= minutes;
    t = endMs;
    driver.offSinceMs = t;
    current = chosen;
  }

  return {
    legs,
    arrivalMs: t,
    restMinutes: legs.filter((l) => l.kind === 'rest').reduce((sum, l) => sum + l.minutes, 0),
    drivingMinutesByDriver: team.map((d) => d.totalDrivingMinutes),
  };
}

/**
 * Season balance: colonies needed by contracts vs colonies available, week by week (ISO weeks,
 * Monday start), by count and by strength.
 *
 * Model (docs/calculations.md):
 * - A contract needs its colonies in every week its [deliveryDate, removalDate] touches.
 * - A lot counts as available in a week only when its [availableFrom, availableTo] covers the whole
 *   week (Monday–Sunday): a conservative reading for planning.
 * - Strength: a lot's colonies are graded by the lot's mean frames of bees. The weekly need can be met
 *   by strength only if, for every contract minimum m, the colonies needed at ≥ m do not exceed
 *   the colonies available at ≥ m — for nested thresholds this is exactly Hall's condition
 *   (Hall 1935), so the check is both necessary and sufficient.
 */
import { addDays, calendarDateToEpochDay, parseCalendarDate } from './calendar-date';
import { assertInRange, assertInteger } from './guards';
import { isoWeekLabel, isoWeekStart } from './iso-week';

/** A pollination contract as the balance needs it. */
export interface ContractDemand {
  /** Contract id. */
  id: string;
  /** Colonies ordered. */
  colonies: number;
  /** Minimum frames of bees per colony (0 when none). */
  minFramesOfBees: number;
  /** First day colonies must be in place, 'YYYY-MM-DD'. */
  deliveryDate: string;
  /** Day they leave, 'YYYY-MM-DD' (inclusive). */
  removalDate: string;
}

/** A lot of colonies available over a period. */
export interface ColonySupply {
  /** Lot id. */
  id: string;
  /** Colonies in the lot. */
  colonies: number;
  /** Mean frames of bees of the lot. */
  meanFramesOfBees: number;
  /** First day available, 'YYYY-MM-DD'. */
  availableFrom: string;
  /** Last day available, 'YYYY-MM-DD' (inclusive); open-ended when absent. */
  availableTo?: string;
}

/** Input of computeSeasonBalance. */
export interface SeasonBalanceInput {
  /** Contracts. */
  contracts: readonly ContractDemand[];
  /** Colony lots. */
  lots: readonly ColonySupply[];
  /** First day of the period, 'YYYY-MM-DD'. */
  from: string;
  /** Last day of the period, 'YYYY-MM-DD'. */
  to: string;
}

/** Needed vs available at or above one strength threshold. */
export interface StrengthBalance {
  /** Threshold, frames of bees. */
  minFramesOfBees: number;
  /** Colonies needed by contracts with a minimum ≥ this threshold. */
  needed: number;
  /** Colonies available with mean frames ≥ this threshold. */
  available: number;
  /** max(0, needed − available). */
  shortfall: number;
}

/** One ISO week of the balance. */
export interface WeekBalance {
  /** ISO week label, e.g. 2026-W05. */
  week: string;
  /** Monday, 'YYYY-MM-DD'. */
  weekStart: string;
  /** Colonies needed by contracts active that week. */
  coloniesNeeded: number;
  /** Colonies available all week. */
  coloniesAvailable: number;
  /** max(0, needed − available). */
  shortfall: number;
  /** Balance per contract minimum, strongest first. */
  byStrength: StrengthBalance[];
  /** True when count and every strength threshold are covered. */
  covered: boolean;
  /** Contracts active that week. */
  contractIds: string[];
}

function checkDates(name: string, from: string, to: string): void {
  parseCalendarDate(from);
  parseCalendarDate(to);
  if (to < from) throw new RangeError(`${name}: end ${to} is before start ${from}`);
}

/** Week-by-week colonies needed vs available, by count and by strength. */
export function computeSeasonBalance(input: SeasonBalanceInput): WeekBalance[] {
  checkDates('period', input.from, input.to);
  input.contracts.forEach((c, i) => {
    assertInteger(`contracts[${i}].colonies`, c.colonies, 0);
    assertInRange(`contracts[${i}].minFramesOfBees`, c.minFramesOfBees, 0, 30);
    checkDates(`contracts[${i}]`, c.deliveryDate, c.removalDate);
  });
  input.lots.forEach((l, i) => {
    assertInteger(`lots[${i}].colonies`, l.colonies, 0);
    assertInRange(`lots[${i}].meanFramesOfBees`, l.meanFramesOfBees, 0, 30);
    checkDates(`lots[${i}]`, l.availableFrom, l.availableTo ?? '9999-12-31');
  });
  const weeks: WeekBalance[] = [];
  for (let monday = isoWeekStart(input.from); monday <= input.to; monday = addDays(monday, 7)) {
    const sunday = addDays(monday, 6);
    const active = input.contracts.filter(
      (c) => c.deliveryDate <= sunday && c.removalDate >= monday,
    );
    const lots = input.lots.filter(
      (l) => l.availableFrom <= monday && (l.availableTo === undefined || l.availableTo >= sunday),
    );
    const coloniesNeeded = active.reduce((s, c) => s + c.colonies, 0);
    const coloniesAvailable = lots.reduce((s, l) => s + l.colonies, 0);
    const thresholds = [...new Set(active.map((c) => c.minFramesOfBees))].sort((a, b) => b - a);
    const byStrength = thresholds.map((threshold) => {
      const needed = active
        .filter((c) => c.minFramesOfBees >= threshold)
        .reduce((s, c) => s + c.colonies, 0);
      const available = lots
        .filter((l) => l.meanFramesOfBees >= threshold)
        .reduce((s, l) => s + l.colonies, 0);
      return {
        minFramesOfBees: threshold,
        needed,
        available,
        shortfall: Math.max(0, needed - available),
      };
    });
    const shortfall = Math.max(0, coloniesNeeded - coloniesAvailable);
    weeks.push({
      week: isoWeekLabel(monday),
      weekStart: monday,
      coloniesNeeded,
      coloniesAvailable,
      shortfall,
      byStrength,
      covered: shortfall === 0 && byStrength.every((b) => b.shortfall === 0),
      contractIds: active.map((c) => c.id),
    });
  }
  return weeks;
}

/** Number of ISO weeks the balance covers for a period. */
export function weeksInPeriod(from: string, to: string): number {
  checkDates('period', from, to);
  return (
    (calendarDateToEpochDay(isoWeekStart(to)) - calendarDateToEpochDay(isoWeekStart(from))) / 7 + 1
  );
}

/**
 * Calendar dates as 'YYYY-MM-DD' strings (proleptic Gregorian, ISO 8601), handled in UTC so the
 * machine's own time zone never shifts a day.
 */

const DATE_PATTERN = /^(\d{4})-(\d{2})-(\d{2})$/;
const DAY_MS = 86_400_000;

/** A calendar date split into its parts. */
export interface CalendarDate {
  /** Year. */
  year: number;
  /** Month 1–12. */
  month: number;
  /** Day of month 1–31. */
  day: number;
}

/** True when `text` is a 'YYYY-MM-DD' date that exists (2026-02-30 does not). */
export function isCalendarDate(text: unknown): text is string {
  if (typeof text !== 'string') return false;
  const match = DATE_PATTERN.exec(text);
  if (!match) return false;
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])];
  const date = new Date(Date.UTC(year, month - 1, day));
  return (
    date.getUTCFullYear() === year && date.getUTCMonth() === month - 1 && date.getUTCDate() === day
  );
}

/** Parses a 'YYYY-MM-DD' date, throwing a RangeError naming the text when it does not exist. */
export function parseCalendarDate(text: string): CalendarDate {
  if (!isCalendarDate(text)) {
    throw new RangeError(`expected an existing date as YYYY-MM-DD, got ${JSON.stringify(text)}`);
  }
  const [year, month, day] = text.split('-').map(Number);
  return { year, month, day };
}

/** Days since 1970-01-01 of a 'YYYY-MM-DD' date. */
export function calendarDateToEpochDay(text: string): number {
  const { year, month, day } = parseCalendarDate(text);
  return Date.UTC(year, month - 1, day) / DAY_MS;
}

/** The 'YYYY-MM-DD' date of a day count since 1970-01-01. */
export function epochDayToCalendarDate(epochDay: number): string {
  return new Date(epochDay * DAY_MS).toISOString().slice(0, 10);
}

/** Adds whole days to a 'YYYY-MM-DD' date. */
export function addDays(text: string, days: number): string {
  return epochDayToCalendarDate(calendarDateToEpochDay(text) + days);
}

/** ISO weekday of a date: 1 = Monday … 7 = Sunday. */
export function isoWeekday(text: string): number {
  const weekday = new Date(calendarDateToEpochDay(text) * DAY_MS).getUTCDay();
  return weekday === 0 ? 7 : weekday;
}

/**
 * ISO 8601 weeks: Monday to Sunday; week 1 is the week holding the year's first Thursday.
 */
import { addDays, isoWeekday } from './calendar-date';

/** The Monday ('YYYY-MM-DD') starting the ISO week that holds `date`. */
export function isoWeekStart(date: string): string {
  return addDays(date, 1 - isoWeekday(date));
}

/** ISO week label such as '2026-W05' (the year is the ISO week-numbering year). */
export function isoWeekLabel(date: string): string {
  const thursday = addDays(date, 4 - isoWeekday(date));
  const year = Number(thursday.slice(0, 4));
  const january4 = `${year}-01-04`;
  const week1Monday = isoWeekStart(january4);
  const days = (Date.parse(isoWeekStart(date)) - Date.parse(week1Monday)) / 86_400_000;
  return `${year}-W${String(days / 7 + 1).padStart(2, '0')}`;
}

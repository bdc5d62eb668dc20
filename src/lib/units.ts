import type { Units } from '@shared/schemas/users';
import { haToAcres, acresToHa, kgToPounds, poundsToKg } from '@shared/domain/units';

const numberFormat = (maximumFractionDigits: number) =>
  new Intl.NumberFormat('en-US', { maximumFractionDigits });

/** Weight label in the user's units. */
export const weightUnit = (units: Units) => (units === 'imperial' ? 'lb' : 'kg');
/** Area label in the user's units. */
export const areaUnit = (units: Units) => (units === 'imperial' ? 'acres' : 'ha');

/** A weight stored in kg, as a number in the user's units. */
export const weightFromKg = (weightKg: number, units: Units) =>
  units === 'imperial' ? kgToPounds(weightKg) : weightKg;
/** A weight typed in the user's units, in kg. */
export const weightToKg = (value: number, units: Units) =>
  units === 'imperial' ? poundsToKg(value) : value;

/** An area stored in ha, as a number in the user's units. */
export const areaFromHa = (areaHa: number, units: Units) =>
  units === 'imperial' ? haToAcres(areaHa) : areaHa;
/** An area typed in the user's units, in ha. */
export const areaToHa = (value: number, units: Units) =>
  units === 'imperial' ? acresToHa(value) : value;

/** "12,300 lb" or "5,579 kg". */
export function formatWeight(weightKg: number | null | undefined, units: Units) {
  if (weightKg === null || weightKg === undefined) return '—';
  return `${numberFormat(0).format(weightFromKg(weightKg, units))} ${weightUnit(units)}`;
}

/** "120.5 acres" or "48.8 ha". */
export function formatArea(areaHa: number | null | undefined, units: Units) {
  if (areaHa === null || areaHa === undefined) return '—';
  return `${numberFormat(1).format(areaFromHa(areaHa, units))} ${areaUnit(units)}`;
}

/** Whole numbers with thousands separators. */
export const formatCount = (value: number) => numberFormat(0).format(value);

/** Cents as dollars: 21500 → "$215.00". */
export function formatDollars(cents: number | null | undefined) {
  if (cents === null || cents === undefined) return '—';
  return new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' }).format(cents / 100);
}

/** A calendar date YYYY-MM-DD as "Mar 4, 2026" (no time-zone shift). */
export function formatDate(date: string | null | undefined) {
  if (!date) return '—';
  const [y, m, d] = date.slice(0, 10).split('-').map(Number);
  return new Intl.DateTimeFormat('en-US', { dateStyle: 'medium', timeZone: 'UTC' }).format(
    new Date(Date.UTC(y, m - 1, d)),
  );
}

/** An instant as local date and time. */
export function formatDateTime(iso: string) {
  return new Intl.DateTimeFormat('en-US', { dateStyle: 'medium', timeStyle: 'short' }).format(
    new Date(iso),
  );
}

/** Today in the browser's calendar, YYYY-MM-DD. */
export function todayIso() {
  const now = new Date();
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

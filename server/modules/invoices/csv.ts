/** A number we formatted ourselves: written as-is, never prefixed. */
export class NumericCell {
  constructor(readonly value: string) {}
}

/** Cents as a plain decimal amount, e.g. -360.00. */
export const amountCell = (cents: number) => new NumericCell((cents / 100).toFixed(2));

export type CsvValue = string | number | NumericCell | null | undefined;

/**
 * One CSV cell (RFC 4180): quoted when it holds a comma, quote or line break, quotes doubled.
 * Text that a spreadsheet would run as a formula (starting with = + - @, tab or carriage
 * return) gets a leading apostrophe first (OWASP "CSV injection").
 */
export function csvCell(value: CsvValue): string {
  if (value instanceof NumericCell) return value.value;
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  let text = value ?? '';
  if (/^[=+\-@\t\r]/.test(text)) text = `'${text}`;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** A whole CSV document with CRLF line ends, header first. */
export function toCsv(header: string[], rows: CsvValue[][]): string {
  return [header, ...rows].map((row) => row.map(csvCell).join(',')).join('\r\n') + '\r\n';
}

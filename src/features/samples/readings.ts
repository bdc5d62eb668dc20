/** Readings typed as one list (weights or frame counts), and how to name the bad ones. */

/** A typed list split into entries, the numbers among them, and the entries that are not numbers. */
export interface ParsedReadings {
  /** Every entry as typed, in order. */
  entries: string[];
  /** The entries that are plain numbers, as numbers, in order. */
  values: number[];
  /** The entries that are not plain numbers, as typed. */
  invalid: string[];
}

const separators = /[\s,;]+/;
// Plain decimals only: Number() would also take "0x1F", "1e3" or "Infinity", which no scale shows.
const plainNumber = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)$/;

/** Splits readings at spaces, commas, semicolons and new lines; "52.5" is one reading. */
export function parseReadings(text: string): ParsedReadings {
  const entries = text.split(separators).filter(Boolean);
  const numbers = entries.filter((entry) => plainNumber.test(entry));
  return {
    entries,
    values: numbers.map(Number),
    invalid: entries.filter((entry) => !plainNumber.test(entry)),
  };
}

/** 'Not numbers: "4o", "x". …', naming up to five bad entries. */
export function invalidReadingsMessage(invalid: readonly string[]): string {
  const shown = invalid
    .slice(0, 5)
    .map((entry) => `"${entry}"`)
    .join(', ');
  const more = invalid.length > 5 ? ` and ${invalid.length - 5} more` : '';
  return (
    `Not ${invalid.length === 1 ? 'a number' : 'numbers'}: ${shown}${more}. ` +
    'Separate readings with spaces, commas or new lines; use a dot for decimals.'
  );
}

/** A problem with one reading (index into the list) or with the whole list (index null). */
export interface ReadingIssue {
  index: number | null;
  message: string;
}

/**
 * One message for the readings field: "Reading 3 (300 lb): A hive weighs at most 250 kg."
 * Readings are named by position and as typed, since the schema's message may be in other units.
 */
export function readingIssuesMessage(
  issues: readonly ReadingIssue[],
  entries: readonly string[],
  unit = '',
): string {
  const whole = issues.filter((issue) => issue.index === null).map((issue) => issue.message);
  const byReading = issues
    .filter((issue): issue is { index: number; message: string } => issue.index !== null)
    .sort((a, b) => a.index - b.index);
  const named = byReading.slice(0, 3).map(({ index, message }) => {
    const typed = entries[index];
    const shown = typed === undefined ? '' : ` (${typed}${unit ? ` ${unit}` : ''})`;
    return `Reading ${index + 1}${shown}: ${message}`;
  });
  const more = byReading.length > 3 ? [`${byReading.length - 3} more readings need a look.`] : [];
  return [...whole, ...named, ...more].join(' ');
}

/** The reading index in an issue path such as "weightsKg.0" (null for "weightsKg" itself). */
export function readingIndexOf(field: string): number | null {
  const index = Number(field.split('.')[1]);
  return Number.isInteger(index) ? index : null;
}

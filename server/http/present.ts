/** Dates as ISO strings and archived flags, the same way in every response. */
export function isoOrNull(value: Date | null | undefined): string | null {
  return value ? value.toISOString() : null;
}

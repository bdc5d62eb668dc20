/**
 * Times as the API writes them: ISO 8601 in the place's own zone (`2027-01-26T18:32:10-06:00`).
 * They are shown on the clock of that place, never converted to the browser's zone.
 */
const ISO_LOCAL =
  /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::\d{2}(?:\.\d+)?)?(Z|[+-]\d{2}:?\d{2})$/;
const WEEKDAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'];

/** "UTC−6" from "-06:00" ("UTC" for Z). */
export function offsetLabel(offset: string) {
  if (offset === 'Z' || /^[+-]00:?00$/.test(offset)) return 'UTC';
  const sign = offset.startsWith('-') ? '−' : '+';
  const [hours, minutes] = offset.slice(1).replace(':', '').match(/\d{2}/g)!.map(Number);
  return `UTC${sign}${hours}${minutes ? `:${String(minutes).padStart(2, '0')}` : ''}`;
}

/** The zone's short name at an instant (CST, MDT); null when the browser only knows "GMT-6". */
export function zoneAbbreviation(iso: string, timeZone: string): string | null {
  try {
    const part = new Intl.DateTimeFormat('en-US', { timeZone, timeZoneName: 'short' })
      .formatToParts(new Date(iso))
      .find((p) => p.type === 'timeZoneName')?.value;
    return part && !/^(GMT|UTC)/.test(part) ? part : null;
  } catch {
    return null;
  }
}

/**
 * "Tue 8:34 PM CST (UTC−6)": the wall clock written in the instant itself, its zone's short name
 * when the zone is known, and its offset always.
 */
export function formatLocalTime(iso: string | null | undefined, timeZone?: string | null) {
  if (!iso) return '—';
  const match = ISO_LOCAL.exec(iso);
  if (!match) return iso;
  const [, y, mo, d, h, mi, offset] = match;
  const weekday = WEEKDAYS[new Date(Date.UTC(+y, +mo - 1, +d)).getUTCDay()];
  const hour = Number(h);
  const clock = `${hour % 12 === 0 ? 12 : hour % 12}:${mi} ${hour < 12 ? 'AM' : 'PM'}`;
  const abbreviation = timeZone ? zoneAbbreviation(iso, timeZone) : null;
  return `${weekday} ${clock}${abbreviation ? ` ${abbreviation}` : ''} (${offsetLabel(offset)})`;
}

/** "2 h 05 min" from minutes. */
export function formatDuration(minutes: number) {
  const whole = Math.round(minutes);
  const hours = Math.floor(whole / 60);
  const rest = whole % 60;
  if (hours === 0) return `${rest} min`;
  return `${hours} h ${String(rest).padStart(2, '0')} min`;
}

const pad = (n: number) => String(n).padStart(2, '0');

/**
 * A `datetime-local` value ("2027-02-20T05:30") read in the browser's time zone, written as an
 * ISO 8601 instant with its offset ("2027-02-20T05:30:00-08:00"); undefined when not a time.
 * A wall time skipped by a daylight-saving jump moves forward, as the browser's Date does.
 */
export function localToInstant(local: string): string | undefined {
  if (!/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2})?$/.test(local)) return undefined;
  const date = new Date(local);
  if (Number.isNaN(date.getTime())) return undefined;
  const offsetMinutes = -date.getTimezoneOffset();
  const sign = offsetMinutes >= 0 ? '+' : '-';
  const abs = Math.abs(offsetMinutes);
  return (
    `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}` +
    `T${pad(date.getHours())}:${pad(date.getMinutes())}:00` +
    `${sign}${pad(Math.floor(abs / 60))}:${pad(abs % 60)}`
  );
}

/** The browser's time zone name, e.g. "America/Los_Angeles". */
export const browserTimeZone = () => Intl.DateTimeFormat().resolvedOptions().timeZone;

/** A notice's window as "Feb 20, 2027, 5:30 AM – 9:00 AM" in the browser's zone. */
export function formatWindow(startsAt: string, endsAt: string): string {
  const start = new Date(startsAt);
  const end = new Date(endsAt);
  const day = (d: Date) => d.toDateString();
  const full = new Intl.DateTimeFormat('en-US', { dateStyle: 'medium', timeStyle: 'short' });
  const time = new Intl.DateTimeFormat('en-US', { timeStyle: 'short' });
  return `${full.format(start)} – ${day(start) === day(end) ? time.format(end) : full.format(end)}`;
}

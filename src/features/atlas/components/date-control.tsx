import { useId } from 'react';
import { addDays, differenceInCalendarDays, format, parseISO } from 'date-fns';

/** Days either side of today the slider reaches: a season and a half. */
const reachDays = 270;

/**
 * The date the map shows: a slider across the season (a day a step, arrow keys move a day,
 * Page Up/Down about ten) and a date field for a jump.
 */
export function DateControl({
  on,
  today,
  onChange,
}: {
  on: string;
  today: string;
  onChange: (on: string) => void;
}) {
  const sliderId = useId();
  const fieldId = useId();
  const base = parseISO(today);
  const offset = differenceInCalendarDays(parseISO(on), base);
  const label = format(parseISO(on), 'EEE d MMM yyyy');
  return (
    <div className="flex flex-col gap-1 text-sm">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <label htmlFor={sliderId} className="font-semibold">
          Positions on <output htmlFor={sliderId}>{label}</output>
        </label>
        <span className="flex items-center gap-2">
          <label htmlFor={fieldId} className="sr-only">
            Date
          </label>
          <input
            id={fieldId}
            type="date"
            className="rounded-md border border-dusk-500 bg-dusk-900 px-2 py-1 text-dusk-100"
            value={on}
            onChange={(event) => event.target.value && onChange(event.target.value)}
          />
          {on !== today && (
            <button
              type="button"
              className="text-ember-300 underline"
              onClick={() => onChange(today)}
            >
              Today
            </button>
          )}
        </span>
      </div>
      <input
        id={sliderId}
        type="range"
        className="w-full accent-ember-400"
        min={-reachDays}
        max={reachDays}
        step={1}
        value={Math.max(-reachDays, Math.min(reachDays, offset))}
        aria-valuetext={label}
        onChange={(event) =>
          onChange(format(addDays(base, Number(event.target.value)), 'yyyy-MM-dd'))
        }
      />
    </div>
  );
}

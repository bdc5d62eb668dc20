/** A big − value + counter for gloved hands (touch targets of 64 px). */
export function Counter({
  value,
  label,
  onChange,
}: {
  value: number;
  label: string;
  onChange: (value: number) => void;
}) {
  return (
    <div className="flex items-center gap-3" role="group" aria-label={label}>
      <button
        type="button"
        className="tn-button tn-big"
        aria-label={`${label}: one fewer`}
        disabled={value <= 0}
        onClick={() => onChange(Math.max(0, value - 1))}
      >
        −
      </button>
      <output
        className="min-w-16 text-center text-4xl font-semibold tabular-nums"
        aria-live="polite"
      >
        {value}
      </output>
      <button
        type="button"
        className="tn-button tn-big tn-button-primary"
        aria-label={`${label}: one more`}
        onClick={() => onChange(value + 1)}
      >
        +
      </button>
    </div>
  );
}

import { cx } from '@/components/ui/cx';
import type { MoveCaution, MoveWarning } from '../types';

const severityLabel = { danger: 'Stop', warning: 'Check', info: 'Note' } as const;
const severityClass = {
  danger: 'border-rosehip-400/60 bg-rosehip-900 text-rosehip-300',
  warning: 'border-ember-600 bg-ember-900 text-ember-200',
  info: 'border-dusk-500 bg-dusk-800 text-dusk-100',
} as const;

/** The plan's warnings as the API returns them, most serious first. */
export function MoveWarnings({ warnings }: { warnings: MoveWarning[] }) {
  if (warnings.length === 0)
    return (
      <p className="text-sage-300">
        No warnings: the plan fits the trucks, the night and the contract.
      </p>
    );
  return (
    <ul className="flex flex-col gap-2" aria-label="Warnings">
      {warnings.map((w, i) => (
        <li
          key={`${w.code}-${w.truckKey ?? ''}-${i}`}
          data-warning={w.code}
          className={cx('rounded-md border px-3 py-2 text-sm', severityClass[w.severity])}
        >
          <span className="mr-2 font-semibold uppercase tracking-wide">
            {severityLabel[w.severity]}
          </span>
          {w.message}
        </li>
      ))}
    </ul>
  );
}

/** Cautions for the crew; each defers to state rules and licensed practice. */
export function MoveCautions({
  cautions,
  compact,
}: {
  cautions: MoveCaution[];
  compact?: boolean;
}) {
  if (cautions.length === 0) return null;
  return (
    <div className={cx('text-sm', compact ? '' : 'rounded-md border border-ember-600/60 p-3')}>
      <ul className="flex list-disc flex-col gap-1 pl-5">
        {cautions.map((c) => (
          <li key={c.code} data-caution={c.code}>
            {c.message}
          </li>
        ))}
      </ul>
      <p className="mt-2 text-dusk-300">
        Rules of thumb only: state rules, permits and licensed practice come first.
      </p>
    </div>
  );
}

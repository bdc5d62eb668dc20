import type { ReactNode } from 'react';
import { cx } from './cx';

/** A message block above a form or page: an error, a warning or a note. */
export function Alert({
  tone = 'error',
  title,
  children,
}: {
  tone?: 'error' | 'warning' | 'info';
  title?: string;
  children?: ReactNode;
}) {
  return (
    <div
      role={tone === 'info' ? 'status' : 'alert'}
      className={cx(
        'rounded-md border px-4 py-3',
        tone === 'error' && 'border-rosehip-400/60 bg-rosehip-900 text-rosehip-300',
        tone === 'warning' && 'border-ember-600 bg-ember-900 text-ember-200',
        tone === 'info' && 'border-dusk-500 bg-dusk-800 text-dusk-100',
      )}
    >
      {title && <p className="font-semibold">{title}</p>}
      {children && <div className="mt-1 text-sm">{children}</div>}
    </div>
  );
}

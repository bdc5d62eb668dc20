import type { ReactNode } from 'react';
import { cx } from './cx';

type Tone = 'neutral' | 'amber' | 'green' | 'red';
const tones: Record<Tone, string> = {
  neutral: 'bg-dusk-700 text-dusk-100',
  amber: 'bg-ember-900 text-ember-300 ring-1 ring-ember-600',
  green: 'bg-sage-900 text-sage-300 ring-1 ring-sage-400/40',
  red: 'bg-rosehip-900 text-rosehip-300 ring-1 ring-rosehip-400/40',
};

/** A small label for a status or kind. */
export function Badge({ tone = 'neutral', children }: { tone?: Tone; children: ReactNode }) {
  return (
    <span className={cx('inline-flex rounded px-2 py-0.5 text-sm font-medium', tones[tone])}>
      {children}
    </span>
  );
}

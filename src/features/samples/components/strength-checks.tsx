import type { ReactNode } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { SimpleTable } from '@/components/ui/table';
import { formatCount, formatDate } from '@/lib/units';
import type { StrengthSample } from '../types';

/** The common almond pollination minimum, frames of bees per colony (also the API's default). */
export const ALMOND_MINIMUM_FRAMES = 6;

const oneDecimal = new Intl.NumberFormat('en-US', {
  minimumFractionDigits: 1,
  maximumFractionDigits: 1,
});
const percent = (share: number) => `${Math.round(share * 100)} %`;

function meanCell(sample: StrengthSample): ReactNode {
  const { summary } = sample;
  if (!summary) {
    return `${oneDecimal.format(sample.frames[0] ?? 0)} (one colony: no interval)`;
  }
  const { lower, upper } = summary.meanInterval;
  return (
    <>
      <span className="font-medium">{oneDecimal.format(summary.meanFrames)}</span>{' '}
      <span className="whitespace-nowrap text-dusk-300">
        ({oneDecimal.format(lower)}–{oneDecimal.format(upper)})
      </span>
    </>
  );
}

function shareCell(sample: StrengthSample): ReactNode {
  const { summary } = sample;
  if (!summary) return '—';
  const { lower, upper } = summary.shareInterval;
  return (
    <>
      <span className="font-medium">{percent(summary.shareAtOrAboveMinimum)}</span>{' '}
      <span className="whitespace-nowrap text-dusk-300">
        ({percent(lower)}–{percent(upper)})
      </span>
    </>
  );
}

/** Strength checks at a place, newest first: mean frames and the share meeting the minimum. */
export function StrengthChecks({
  samples,
  lotNames,
}: {
  samples: StrengthSample[];
  lotNames: Record<string, string>;
}) {
  if (samples.length === 0) {
    return (
      <EmptyState title="No strength checks here yet">
        Open a random tenth or so of the colonies, count the frames of bees in each, then use Record
        strength check to type the counts. The mean and the share at or above{' '}
        {ALMOND_MINIMUM_FRAMES} frames show here.
      </EmptyState>
    );
  }
  const minimum = samples[0].minimumFrames;
  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm text-dusk-300">
        {minimum} frames of bees is the common almond minimum. In brackets: the 95 % interval, where
        the whole yard’s figure very likely lies given the colonies inspected.
      </p>
      <SimpleTable
        caption="Strength checks"
        headers={[
          'Date',
          'Lot',
          'Colonies inspected',
          'Mean frames',
          `At or above ${minimum} frames`,
        ]}
        rows={samples.map((sample) => [
          <span className="whitespace-nowrap">{formatDate(sample.sampledOn)}</span>,
          sample.lotId ? (lotNames[sample.lotId] ?? 'Lot') : 'Mixed or not known',
          formatCount(sample.frames.length),
          meanCell(sample),
          shareCell(sample),
        ])}
      />
    </div>
  );
}

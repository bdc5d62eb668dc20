import type { Units } from '@shared/schemas/users';
import { EmptyState } from '@/components/ui/empty-state';
import { SimpleTable } from '@/components/ui/table';
import { formatCount, formatDate, formatWeight, weightFromKg, weightUnit } from '@/lib/units';
import type { WeightSample } from '../types';

const oneDecimal = new Intl.NumberFormat('en-US', {
  minimumFractionDigits: 1,
  maximumFractionDigits: 1,
});

/** "142.3 ± 9.1 lb": a mean and standard deviation stored in kg, in the user's units. */
export function formatWeightSpread(meanKg: number, sdKg: number, units: Units) {
  const mean = oneDecimal.format(weightFromKg(meanKg, units));
  const sd = oneDecimal.format(weightFromKg(sdKg, units));
  return `${mean} ± ${sd} ${weightUnit(units)}`;
}

/** Scale readings at a yard, newest first: how many hives, their mean weight and spread. */
export function ScaleReadings({
  samples,
  lotNames,
  units,
}: {
  samples: WeightSample[];
  lotNames: Record<string, string>;
  units: Units;
}) {
  if (samples.length === 0) {
    return (
      <EmptyState title="No hives weighed here yet">
        Weigh a few hives on the scale, then use Record weights to type them in. Load plans for
        moves from this yard can then use weighed hives rather than the box setup’s estimate.
      </EmptyState>
    );
  }
  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm text-dusk-300">
        Load plans use the mean and the spread (± one standard deviation): a truck is loaded for the
        mean hive, with a margin that grows with the spread and shrinks as more hives are weighed.
      </p>
      <SimpleTable
        caption="Scale readings"
        headers={['Date', 'Lot', 'Hives weighed', 'Mean ± sd']}
        rows={samples.map((sample) => [
          <span className="whitespace-nowrap">{formatDate(sample.sampledOn)}</span>,
          sample.lotId ? (lotNames[sample.lotId] ?? 'Lot') : 'Mixed or not known',
          formatCount(sample.weightsKg.length),
          <span className="font-medium whitespace-nowrap">
            {sample.summary
              ? formatWeightSpread(sample.summary.mean, sample.summary.sd, units)
              : `${formatWeight(sample.weightsKg[0], units)} (one hive: no spread)`}
          </span>,
        ])}
      />
    </div>
  );
}

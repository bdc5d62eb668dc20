import { weightSampleCreateRequest, type WeightSampleCreateRequest } from '@shared/schemas/samples';
import type { Units } from '@shared/schemas/users';
import { formatCount, weightToKg, weightUnit } from '@/lib/units';
import { useCreateWeightSample } from '../api/create-weight-sample';
import type { LotChoice } from '../types';
import { SampleForm, type SampleFormValues } from './sample-form';

/** The request a scale reading at `yardId` makes; weights typed in `units` are sent in kg. */
export function toWeightSampleRequest(
  values: SampleFormValues,
  weights: number[],
  yardId: string,
  units: Units,
): WeightSampleCreateRequest {
  return {
    yardId,
    lotId: values.lotId || null,
    sampledOn: values.sampledOn,
    weightsKg: weights.map((weight) => weightToKg(weight, units)),
    notes: values.notes.trim(),
  };
}

interface WeightSampleFormProps {
  yardId: string;
  yardName: string;
  /** The lots here today, passed in by the route. */
  lots: LotChoice[];
  /** The user's units: weights are typed in them. */
  units: Units;
  onRecorded?: (summary: string) => void;
  onCancel?: () => void;
}

/** Records hive weights read off a scale at a yard, typed in the user's units. */
export function WeightSampleForm({
  yardId,
  yardName,
  lots,
  units,
  onRecorded,
  onCancel,
}: WeightSampleFormProps) {
  const create = useCreateWeightSample();
  const unit = weightUnit(units);
  return (
    <SampleForm<WeightSampleCreateRequest>
      formLabel="Record hive weights"
      readingsLabel={`Hive weights (${unit})`}
      readingsHint={`One weight per hive, in ${unit}, separated by spaces, commas or new lines.`}
      readingUnit={unit}
      submitLabel="Record weights"
      lots={lots}
      schema={weightSampleCreateRequest}
      readingsField="weightsKg"
      // The spread needs two hives; the load plan cannot use a single weight.
      fewestReadings={{
        count: 2,
        message: 'Weigh at least two hives: the load plan needs the spread between them.',
      }}
      toRequest={(values, weights) => toWeightSampleRequest(values, weights, yardId, units)}
      save={(request) => create.mutateAsync(request)}
      describe={(weights) => `${formatCount(weights.length)} hive weights recorded at ${yardName}.`}
      onRecorded={onRecorded}
      onCancel={onCancel}
    />
  );
}

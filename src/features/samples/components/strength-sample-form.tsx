import {
  strengthSampleCreateRequest,
  type StrengthSampleCreateRequest,
} from '@shared/schemas/samples';
import { formatCount } from '@/lib/units';
import { useCreateStrengthSample } from '../api/create-strength-sample';
import type { LotChoice } from '../types';
import { SampleForm, type SampleFormValues } from './sample-form';

/** The request a strength check at yard `yardId` makes. */
export function toStrengthSampleRequest(
  values: SampleFormValues,
  frames: number[],
  yardId: string,
): StrengthSampleCreateRequest {
  return {
    placeKind: 'yard',
    placeId: yardId,
    lotId: values.lotId || null,
    sampledOn: values.sampledOn,
    frames,
    notes: values.notes.trim(),
  };
}

interface StrengthSampleFormProps {
  yardId: string;
  yardName: string;
  /** The lots here today, passed in by the route. */
  lots: LotChoice[];
  onRecorded?: (summary: string) => void;
  onCancel?: () => void;
}

/** Records the frames of bees counted in each colony inspected at a yard. */
export function StrengthSampleForm({
  yardId,
  yardName,
  lots,
  onRecorded,
  onCancel,
}: StrengthSampleFormProps) {
  const create = useCreateStrengthSample();
  return (
    <SampleForm<StrengthSampleCreateRequest>
      formLabel="Record a strength check"
      readingsLabel="Frames of bees per colony"
      readingsHint="One count per colony inspected, separated by spaces, commas or new lines."
      submitLabel="Record strength check"
      lots={lots}
      schema={strengthSampleCreateRequest}
      readingsField="frames"
      fewestReadings={{ count: 1, message: 'Enter at least one colony.' }}
      toRequest={(values, frames) => toStrengthSampleRequest(values, frames, yardId)}
      save={(request) => create.mutateAsync(request)}
      describe={(frames) =>
        `Strength check of ${formatCount(frames.length)} ${frames.length === 1 ? 'colony' : 'colonies'} recorded at ${yardName}.`
      }
      onRecorded={onRecorded}
      onCancel={onCancel}
    />
  );
}

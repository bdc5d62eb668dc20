import { useForm, type Resolver } from 'react-hook-form';
import {
  ledgerEntryCreateRequest,
  type LedgerEntryCreateRequest,
  type Place,
} from '@shared/schemas/ledger';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormAlert } from '@/components/ui/form-alert';
import { useFormFailure } from '@/hooks/use-form-failure';
import { Input, Select, Textarea } from '@/components/ui/input';
import { applyServerErrors, asNumber, schemaResolver } from '@/lib/forms';
import { formatCount, todayIso } from '@/lib/units';
import { useCreateLedgerEntry } from '../api/create-ledger-entry';

/** The kinds of entry recorded at a place by hand (moves come from the move planner). */
export type PlaceEntryKind = 'loss' | 'split' | 'purchase' | 'correction-remove' | 'correction-add';

const kindOptions: Array<{ value: PlaceEntryKind; label: string }> = [
  { value: 'loss', label: 'Loss: dead-outs or colonies gone' },
  { value: 'split', label: 'Split: new colonies made here' },
  { value: 'purchase', label: 'Purchase: colonies bought in' },
  { value: 'correction-remove', label: 'Correction: fewer than recorded' },
  { value: 'correction-add', label: 'Correction: more than recorded' },
];

export interface LedgerFormValues {
  lotId: string;
  kind: PlaceEntryKind;
  colonies: number;
  occurredOn: string;
  reason: string;
}

/** The API request an entry at `place` makes. */
export function toLedgerRequest(values: LedgerFormValues, place: Place): LedgerEntryCreateRequest {
  const removes = values.kind === 'loss' || values.kind === 'correction-remove';
  return {
    lotId: values.lotId,
    kind: values.kind.startsWith('correction')
      ? 'correction'
      : (values.kind as LedgerEntryCreateRequest['kind']),
    occurredOn: values.occurredOn,
    colonies: values.colonies,
    from: removes ? place : null,
    to: removes ? null : place,
    reason: values.reason,
  };
}

const requestResolver = schemaResolver(ledgerEntryCreateRequest);

// Validates with the API's schema; problems with "from"/"to" belong to the kind the user chose.
const resolverFor =
  (place: Place): Resolver<LedgerFormValues> =>
  async (values, context, options) => {
    const result = await requestResolver(toLedgerRequest(values, place), context, options as never);
    const errors = { ...(result.errors as Record<string, unknown>) };
    const sideError = errors.from ?? errors.to;
    delete errors.from;
    delete errors.to;
    if (sideError && !errors.kind) errors.kind = sideError;
    return Object.keys(errors).length
      ? { values: {}, errors: errors as never }
      : { values, errors: {} };
  };

interface LedgerEntryFormProps {
  place: Place;
  placeName: string;
  /** The colony lots to choose from, with how many of each are here today. */
  lots: Array<{ id: string; name: string; coloniesHere: number }>;
  onRecorded?: (summary: string) => void;
  onCancel?: () => void;
}

/** Records a loss, split, purchase or correction at a yard or site, with the reason. */
export function LedgerEntryForm({
  place,
  placeName,
  lots,
  onRecorded,
  onCancel,
}: LedgerEntryFormProps) {
  const create = useCreateLedgerEntry();
  const saveFailure = useFormFailure();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<LedgerFormValues>({
    resolver: resolverFor(place),
    defaultValues: {
      lotId: lots.find((l) => l.coloniesHere > 0)?.id ?? lots[0]?.id ?? '',
      kind: 'loss',
      occurredOn: todayIso(),
      reason: '',
    },
  });

  const submit = handleSubmit(async (values) => {
    saveFailure.clear();
    try {
      await create.mutateAsync(toLedgerRequest(values, place));
      const verb =
        values.kind === 'loss' || values.kind === 'correction-remove' ? 'removed from' : 'added to';
      onRecorded?.(`${formatCount(values.colonies)} colonies ${verb} ${placeName}.`);
    } catch (error) {
      const issues = applyServerErrors(error, setError, [
        'lotId',
        'kind',
        'colonies',
        'occurredOn',
        'reason',
      ]);
      saveFailure.fail(error, issues);
    }
  });

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label="Record a ledger entry"
      className="flex flex-col gap-4"
    >
      <FormAlert error={saveFailure.failure} unplaced={saveFailure.unplaced} />
      <Field label="What happened" error={errors.kind?.message}>
        <Select {...register('kind')}>
          {kindOptions.map((option) => (
            <option key={option.value} value={option.value}>
              {option.label}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Colony lot" error={errors.lotId?.message}>
        <Select {...register('lotId')}>
          {lots.length === 0 && <option value="">No colony lots yet: add one in Settings</option>}
          {lots.map((lot) => (
            <option key={lot.id} value={lot.id}>
              {lot.name} ({formatCount(lot.coloniesHere)} here)
            </option>
          ))}
        </Select>
      </Field>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Number of colonies" error={errors.colonies?.message}>
          <Input
            type="number"
            inputMode="numeric"
            min="1"
            step="1"
            {...register('colonies', asNumber)}
          />
        </Field>
        <Field label="Date" error={errors.occurredOn?.message}>
          <Input type="date" {...register('occurredOn')} />
        </Field>
      </div>
      <Field
        label="Reason"
        hint="A few words for whoever reads this later"
        error={errors.reason?.message}
      >
        <Textarea rows={2} {...register('reason')} />
      </Field>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={isSubmitting}>
          Record entry
        </Button>
        {onCancel && (
          <Button variant="ghost" onClick={onCancel}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}

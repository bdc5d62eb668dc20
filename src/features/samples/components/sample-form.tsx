import {
  useForm,
  type FieldError,
  type FieldValues,
  type Resolver,
  type UseFormSetError,
} from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormAlert } from '@/components/ui/form-alert';
import { useFormFailure } from '@/hooks/use-form-failure';
import { Input, Select, Textarea } from '@/components/ui/input';
import { applyServerErrors, schemaResolver } from '@/lib/forms';
import { formatCount, todayIso } from '@/lib/units';
import {
  invalidReadingsMessage,
  parseReadings,
  readingIndexOf,
  readingIssuesMessage,
  type ReadingIssue,
} from '../readings';
import type { LotChoice } from '../types';

/** What the user types: the readings stay text until submitted. */
export interface SampleFormValues {
  lotId: string;
  sampledOn: string;
  readings: string;
  notes: string;
}

/** Fields the form and the request share; server issues there go on the field. */
const sharedFields = ['lotId', 'sampledOn', 'notes'];

export interface SampleFormProps<Request> {
  /** The form's accessible name. */
  formLabel: string;
  readingsLabel: string;
  readingsHint: string;
  /** Unit the readings are typed in, to name a bad one ("Reading 2 (300 lb)"). */
  readingUnit?: string;
  submitLabel: string;
  lots: LotChoice[];
  /** The shared schema of the request. */
  schema: z.ZodType<Request>;
  /** The request field holding the readings (weightsKg, frames); its issues show on the readings. */
  readingsField: string;
  /** The fewest readings worth recording, and what to say when there are fewer. */
  fewestReadings: { count: number; message: string };
  toRequest: (values: SampleFormValues, readings: number[]) => Request;
  save: (request: Request) => Promise<unknown>;
  /** The line the caller hears once recorded, from the readings as typed. */
  describe: (readings: number[]) => string;
  onRecorded?: (summary: string) => void;
  onCancel?: () => void;
}

/** Issues a resolver put on the readings array: one for the list, or one per reading. */
function readingIssuesFrom(error: unknown): ReadingIssue[] {
  if (!error || typeof error !== 'object') return [];
  if (Array.isArray(error)) {
    return error.flatMap((item: FieldError | undefined, index) =>
      item?.message ? [{ index, message: item.message }] : [],
    );
  }
  const whole = error as FieldError & { root?: FieldError };
  const message = whole.message ?? whole.root?.message;
  return message ? [{ index: null, message }] : [];
}

/**
 * A sample taken at a place: lot, date, readings typed as a list, notes. Validated with the
 * API's schema on the request the readings make; problems with the readings name the bad ones.
 */
export function SampleForm<Request>({
  formLabel,
  readingsLabel,
  readingsHint,
  readingUnit,
  submitLabel,
  lots,
  schema,
  readingsField,
  fewestReadings,
  toRequest,
  save,
  describe,
  onRecorded,
  onCancel,
}: SampleFormProps<Request>) {
  const saveFailure = useFormFailure();

  const requestResolver = schemaResolver(schema as never) as unknown as Resolver<FieldValues>;
  const resolver: Resolver<SampleFormValues> = async (values, context, options) => {
    const parsed = parseReadings(values.readings);
    const result = await requestResolver(
      toRequest(values, parsed.values) as FieldValues,
      context,
      options as never,
    );
    const { [readingsField]: readingsError, ...others } = result.errors as Record<string, unknown>;
    const errors: Record<string, unknown> = Object.fromEntries(
      Object.entries(others).filter(([field]) => sharedFields.includes(field)),
    );
    const readingsMessage =
      parsed.invalid.length > 0
        ? invalidReadingsMessage(parsed.invalid)
        : parsed.values.length < fewestReadings.count
          ? fewestReadings.message
          : readingIssuesMessage(readingIssuesFrom(readingsError), parsed.entries, readingUnit);
    if (readingsMessage) errors.readings = { type: 'validate', message: readingsMessage };
    return Object.keys(errors).length
      ? { values: {}, errors: errors as never }
      : { values, errors: {} };
  };

  const {
    register,
    handleSubmit,
    setError,
    getValues,
    watch,
    formState: { errors, isSubmitting },
  } = useForm<SampleFormValues>({
    resolver,
    defaultValues: {
      lotId: lots.find((lot) => lot.coloniesHere > 0)?.id ?? '',
      sampledOn: todayIso(),
      readings: '',
      notes: '',
    },
  });

  const submit = handleSubmit(async (values) => {
    saveFailure.clear();
    const readings = parseReadings(values.readings);
    try {
      await save(toRequest(values, readings.values));
      onRecorded?.(describe(readings.values));
    } catch (error) {
      // Issues on single readings ("weightsKg.0") are gathered into one message on the readings.
      const readingIssues: ReadingIssue[] = [];
      const place: UseFormSetError<FieldValues> = (field, fieldError, options) => {
        if (field.split('.')[0] === readingsField) {
          readingIssues.push({ index: readingIndexOf(field), message: fieldError.message ?? '' });
        } else {
          setError(field as keyof SampleFormValues, fieldError, options);
        }
      };
      const unplaced = applyServerErrors(error, place, [...sharedFields, readingsField]);
      if (readingIssues.length > 0) {
        setError(
          'readings',
          {
            type: 'server',
            message: readingIssuesMessage(
              readingIssues,
              parseReadings(getValues('readings')).entries,
              readingUnit,
            ),
          },
          { shouldFocus: true },
        );
      }
      saveFailure.fail(error, unplaced);
    }
  });

  const typed = parseReadings(watch('readings'));
  const counted =
    typed.entries.length === 0
      ? readingsHint
      : `${readingsHint} ${formatCount(typed.values.length)} read so far.`;

  return (
    <form onSubmit={submit} noValidate aria-label={formLabel} className="flex flex-col gap-4">
      <FormAlert error={saveFailure.failure} unplaced={saveFailure.unplaced} />
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Colony lot" error={errors.lotId?.message}>
          <Select {...register('lotId')}>
            {lots.map((lot) => (
              <option key={lot.id} value={lot.id}>
                {lot.name} ({formatCount(lot.coloniesHere)} here)
              </option>
            ))}
            <option value="">Mixed or not known</option>
          </Select>
        </Field>
        <Field label="Date" error={errors.sampledOn?.message}>
          <Input type="date" {...register('sampledOn')} />
        </Field>
      </div>
      <Field label={readingsLabel} hint={counted} error={errors.readings?.message}>
        <Textarea
          rows={4}
          inputMode="decimal"
          spellCheck={false}
          autoComplete="off"
          {...register('readings')}
        />
      </Field>
      <Field
        label="Notes"
        hint="Optional: anything whoever reads this later should know"
        error={errors.notes?.message}
      >
        <Textarea rows={2} {...register('notes')} />
      </Field>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={isSubmitting}>
          {submitLabel}
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

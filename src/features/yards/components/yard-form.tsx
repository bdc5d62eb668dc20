import { useForm } from 'react-hook-form';
import { yardCreateRequest, type YardCreateRequest, type YardView } from '@shared/schemas/yards';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormAlert } from '@/components/ui/form-alert';
import { useFormFailure } from '@/hooks/use-form-failure';
import { Input, Textarea } from '@/components/ui/input';
import { applyServerErrors, asNullableDate, asNumber, schemaResolver } from '@/lib/forms';
import { useCreateYard } from '../api/create-yard';
import { useUpdateYard } from '../api/update-yard';

type YardFormValues = YardCreateRequest;

const fieldNames = [
  'name',
  'latitude',
  'longitude',
  'capacity',
  'accessNotes',
  'notes',
  'lastVisitOn',
];

function defaultsFrom(yard?: YardView): Partial<YardFormValues> {
  return {
    name: yard?.name ?? '',
    latitude: yard?.latitude,
    longitude: yard?.longitude,
    capacity: yard?.capacity,
    accessNotes: yard?.accessNotes ?? '',
    notes: yard?.notes ?? '',
    lastVisitOn: yard?.lastVisitOn ?? null,
  };
}

interface YardFormProps {
  /** The yard being edited; absent when adding one. */
  yard?: YardView;
  onSaved: (yard: YardView) => void;
  onCancel?: () => void;
  /** Loads the latest version of the yard after a conflict. */
  onReload?: () => Promise<unknown>;
}

/** Adds or edits a yard; validated with the API's own schema, server errors shown on fields. */
export function YardForm({ yard, onSaved, onCancel, onReload }: YardFormProps) {
  const create = useCreateYard();
  const update = useUpdateYard();
  const saveFailure = useFormFailure(onReload);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<YardFormValues, unknown, YardFormValues>({
    resolver: schemaResolver(yardCreateRequest),
    defaultValues: defaultsFrom(yard),
  });

  const submit = handleSubmit(async (values) => {
    saveFailure.clear();
    try {
      const saved = yard
        ? await update.mutateAsync({ id: yard.id, version: yard.version, changes: values })
        : await create.mutateAsync(values);
      onSaved(saved);
    } catch (error) {
      saveFailure.fail(error, applyServerErrors(error, setError, fieldNames));
    }
  });

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={yard ? `Edit ${yard.name}` : 'Add a yard'}
      className="flex max-w-2xl flex-col gap-4"
    >
      <FormAlert
        error={saveFailure.failure}
        unplaced={saveFailure.unplaced}
        onReload={saveFailure.reload}
        reloading={saveFailure.reloading}
      />
      <Field label="Yard name" error={errors.name?.message}>
        <Input autoComplete="off" {...register('name')} />
      </Field>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field
          label="Latitude"
          hint="Decimal degrees, e.g. 28.4123"
          error={errors.latitude?.message}
        >
          <Input inputMode="decimal" type="number" step="any" {...register('latitude', asNumber)} />
        </Field>
        <Field
          label="Longitude"
          hint="Decimal degrees, west is negative"
          error={errors.longitude?.message}
        >
          <Input
            inputMode="decimal"
            type="number"
            step="any"
            {...register('longitude', asNumber)}
          />
        </Field>
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Capacity (colonies)" error={errors.capacity?.message}>
          <Input
            inputMode="numeric"
            type="number"
            step="1"
            min="0"
            {...register('capacity', asNumber)}
          />
        </Field>
        <Field label="Last visit" error={errors.lastVisitOn?.message}>
          <Input type="date" {...register('lastVisitOn', asNullableDate)} />
        </Field>
      </div>
      <Field
        label="Access notes"
        hint="Gates, codes, turnarounds: what a driver needs at night"
        error={errors.accessNotes?.message}
      >
        <Textarea {...register('accessNotes')} />
      </Field>
      <Field label="Notes" error={errors.notes?.message}>
        <Textarea {...register('notes')} />
      </Field>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={isSubmitting}>
          {yard ? 'Save' : 'Add yard'}
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

import { useFieldArray, useForm } from 'react-hook-form';
import { growerCreateRequest, type GrowerCreateRequest } from '@shared/schemas/growers';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormAlert } from '@/components/ui/form-alert';
import { useFormFailure } from '@/hooks/use-form-failure';
import { Input, Textarea } from '@/components/ui/input';
import { applyServerErrors, schemaResolver } from '@/lib/forms';
import { useCreateGrower } from '../api/create-grower';
import { useUpdateGrower } from '../api/update-grower';
import type { Grower } from '../types';

type GrowerFormValues = GrowerCreateRequest;
const fieldNames = ['name', 'billingAddress', 'internalNotes', 'contacts'];
const emptyToNull = { setValueAs: (v: unknown) => (v === '' || v === undefined ? null : v) };

function defaultsFrom(grower?: Grower): GrowerFormValues {
  return {
    name: grower?.name ?? '',
    billingAddress: grower?.billingAddress ?? '',
    internalNotes: grower?.internalNotes ?? '',
    contacts: (grower?.contacts ?? []).map((c) => ({
      name: c.name,
      email: c.email,
      phone: c.phone,
      title: c.title,
    })),
  };
}

interface GrowerFormProps {
  grower?: Grower;
  onSaved: (grower: Grower) => void;
  onCancel?: () => void;
  onReload?: () => Promise<unknown>;
}

/** Adds or edits a grower and their list of contacts. */
export function GrowerForm({ grower, onSaved, onCancel, onReload }: GrowerFormProps) {
  const create = useCreateGrower();
  const update = useUpdateGrower();
  const saveFailure = useFormFailure(onReload);
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<GrowerFormValues, unknown, GrowerFormValues>({
    resolver: schemaResolver(growerCreateRequest),
    defaultValues: defaultsFrom(grower),
  });
  const contacts = useFieldArray({ control, name: 'contacts' });

  const submit = handleSubmit(async (values) => {
    saveFailure.clear();
    try {
      const saved = grower
        ? await update.mutateAsync({ id: grower.id, version: grower.version, changes: values })
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
      aria-label={grower ? `Edit ${grower.name}` : 'Add a grower'}
      className="flex max-w-3xl flex-col gap-5"
    >
      <FormAlert
        error={saveFailure.failure}
        unplaced={saveFailure.unplaced}
        onReload={saveFailure.reload}
        reloading={saveFailure.reloading}
      />
      <Field label="Grower or farm name" error={errors.name?.message}>
        <Input {...register('name')} />
      </Field>
      <Field label="Billing address" error={errors.billingAddress?.message}>
        <Textarea {...register('billingAddress')} />
      </Field>
      <Field
        label="Internal notes"
        hint="Never shown to the grower"
        error={errors.internalNotes?.message}
      >
        <Textarea {...register('internalNotes')} />
      </Field>

      <fieldset className="flex flex-col gap-3">
        <legend className="mb-2 text-lg font-semibold text-dusk-50">Contacts</legend>
        {contacts.fields.length === 0 && (
          <p className="text-dusk-300">
            No contacts yet. Add the person who confirms dates and hears about sprays.
          </p>
        )}
        {contacts.fields.map((contact, index) => {
          const errs = errors.contacts?.[index];
          return (
            <div
              key={contact.id}
              className="grid gap-3 rounded-lg bg-dusk-850 p-4 ring-1 ring-dusk-700 sm:grid-cols-2"
              role="group"
              aria-label={`Contact ${index + 1}`}
            >
              <Field label={`Contact ${index + 1} name`} error={errs?.name?.message}>
                <Input {...register(`contacts.${index}.name`)} />
              </Field>
              <Field label={`Contact ${index + 1} role or title`} error={errs?.title?.message}>
                <Input {...register(`contacts.${index}.title`)} placeholder="Orchard manager" />
              </Field>
              <Field label={`Contact ${index + 1} e-mail`} error={errs?.email?.message}>
                <Input type="email" {...register(`contacts.${index}.email`, emptyToNull)} />
              </Field>
              <Field label={`Contact ${index + 1} phone`} error={errs?.phone?.message}>
                <Input type="tel" {...register(`contacts.${index}.phone`, emptyToNull)} />
              </Field>
              <div className="sm:col-span-2">
                <Button variant="ghost" size="sm" onClick={() => contacts.remove(index)}>
                  Remove contact {index + 1}
                </Button>
              </div>
            </div>
          );
        })}
        {errors.contacts?.message && (
          <p className="text-sm font-medium text-rosehip-300">{errors.contacts.message}</p>
        )}
        <div>
          <Button
            variant="secondary"
            size="sm"
            onClick={() => contacts.append({ name: '', title: '', email: null, phone: null })}
          >
            Add contact
          </Button>
        </div>
      </fieldset>

      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={isSubmitting}>
          {grower ? 'Save' : 'Add grower'}
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

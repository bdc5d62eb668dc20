import { useForm, type FieldValues, type Resolver } from 'react-hook-form';
import {
  sprayNoticeCreateRequest,
  type SprayNoticeCreateRequest,
} from '@shared/schemas/spray-notices';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormAlert } from '@/components/ui/form-alert';
import { useFormFailure } from '@/hooks/use-form-failure';
import { Input, Select, Textarea } from '@/components/ui/input';
import { applyServerErrors, schemaResolver } from '@/lib/forms';
import { useCreateSprayNotice } from '../api/create-spray-notice';
import { browserTimeZone, localToInstant } from '../local-instant';
import type { SprayNotice } from '../types';
import { SprayCaution } from './spray-caution';

export interface SprayNoticeFormValues {
  siteId: string;
  /** `datetime-local` values, in the browser's time zone. */
  startsAt: string;
  endsAt: string;
  product: string;
  notes: string;
}

const fieldNames = ['siteId', 'startsAt', 'endsAt', 'product', 'notes'] as const;

/** The request the form's values make: local times become instants with the browser's offset. */
export function toSprayNoticeRequest(values: SprayNoticeFormValues): SprayNoticeCreateRequest {
  const notes = values.notes.trim();
  return {
    siteId: values.siteId,
    startsAt: localToInstant(values.startsAt) ?? values.startsAt,
    endsAt: localToInstant(values.endsAt) ?? values.endsAt,
    product: values.product.trim(),
    ...(notes ? { notes } : {}),
  };
}

const requestResolver = schemaResolver(
  sprayNoticeCreateRequest as never,
) as unknown as Resolver<FieldValues>;

/** Checks the values with the shared schema; an empty time gets a plain message of its own. */
const resolver: Resolver<SprayNoticeFormValues> = async (values, context, options) => {
  const result = await requestResolver(
    toSprayNoticeRequest(values) as unknown as FieldValues,
    context,
    options as never,
  );
  const errors = { ...(result.errors as Record<string, unknown>) };
  if (!values.siteId) errors.siteId = { type: 'required', message: 'Choose a site.' };
  for (const field of ['startsAt', 'endsAt'] as const) {
    if (!values[field]) errors[field] = { type: 'required', message: 'Choose a date and time.' };
  }
  return Object.keys(errors).length
    ? { values: {}, errors: errors as never }
    : { values, errors: {} };
};

interface SprayNoticeFormProps {
  /** The grower's own sites (or, for a planner, sites that have a grower). */
  sites: Array<{ id: string; name: string }>;
  onFiled?: (notice: SprayNotice) => void;
}

/** Files a planned pesticide application so the beekeeper can plan around it. */
export function SprayNoticeForm({ sites, onFiled }: SprayNoticeFormProps) {
  const create = useCreateSprayNotice();
  const saveFailure = useFormFailure();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<SprayNoticeFormValues>({
    resolver,
    defaultValues: {
      siteId: sites.length === 1 ? sites[0].id : '',
      startsAt: '',
      endsAt: '',
      product: '',
      notes: '',
    },
  });

  const submit = handleSubmit(async (values) => {
    saveFailure.clear();
    try {
      const notice = await create.mutateAsync(toSprayNoticeRequest(values));
      reset({ ...values, startsAt: '', endsAt: '', product: '', notes: '' });
      onFiled?.(notice);
    } catch (error) {
      saveFailure.fail(error, applyServerErrors(error, setError, fieldNames));
    }
  });

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label="File a spray notice"
      className="flex flex-col gap-4"
    >
      <SprayCaution />
      <FormAlert error={saveFailure.failure} unplaced={saveFailure.unplaced} />
      <Field label="Site" error={errors.siteId?.message}>
        <Select {...register('siteId')}>
          <option value="">Choose a site…</option>
          {sites.map((site) => (
            <option key={site.id} value={site.id}>
              {site.name}
            </option>
          ))}
        </Select>
      </Field>
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        <Field
          label="Spraying starts"
          error={errors.startsAt?.message}
          hint={`Your time zone: ${browserTimeZone()}`}
        >
          <Input type="datetime-local" {...register('startsAt')} />
        </Field>
        <Field label="Spraying ends" error={errors.endsAt?.message}>
          <Input type="datetime-local" {...register('endsAt')} />
        </Field>
      </div>
      <Field label="Product" error={errors.product?.message} hint="As named on its label.">
        <Input autoComplete="off" {...register('product')} />
      </Field>
      <Field
        label="Notes"
        error={errors.notes?.message}
        hint="Blocks or rows, the applicator, anything the beekeeper should know."
      >
        <Textarea {...register('notes')} />
      </Field>
      <div>
        <Button type="submit" busy={isSubmitting}>
          File spray notice
        </Button>
      </div>
    </form>
  );
}

import type { z } from 'zod';
import { Controller, useForm } from 'react-hook-form';
import { siteCreateRequest, siteKinds, type SiteCreateRequest } from '@shared/schemas/sites';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormAlert } from '@/components/ui/form-alert';
import { useFormFailure } from '@/hooks/use-form-failure';
import { Input, Select, Textarea } from '@/components/ui/input';
import { cropOptions } from '@/lib/crops';
import { applyServerErrors, asNullableDate, asNumber, schemaResolver } from '@/lib/forms';
import { useCreateSite } from '../api/create-site';
import { useUpdateSite } from '../api/update-site';
import type { Site } from '../types';
import { siteKindLabels } from '../types';
import { BoundaryInput } from './boundary-input';

type SiteFormValues = z.input<typeof siteCreateRequest>;
const fieldNames = [
  'growerId',
  'name',
  'kind',
  'crop',
  'boundary',
  'latitude',
  'longitude',
  'bloomStartOn',
  'bloomEndOn',
  'accessNotes',
  'notes',
];

function defaultsFrom(site?: Site): Partial<SiteFormValues> {
  return {
    growerId: site?.growerId ?? null,
    name: site?.name ?? '',
    kind: site?.kind ?? 'orchard',
    crop: site?.crop,
    boundary: site?.boundary ?? null,
    latitude: site?.latitude ?? undefined,
    longitude: site?.longitude ?? undefined,
    bloomStartOn: site?.bloomStartOn ?? null,
    bloomEndOn: site?.bloomEndOn ?? null,
    accessNotes: site?.accessNotes ?? '',
    notes: site?.notes ?? '',
  };
}

interface SiteFormProps {
  site?: Site;
  growers: Array<{ id: string; name: string }>;
  onSaved: (site: Site) => void;
  onCancel?: () => void;
  onReload?: () => Promise<unknown>;
}

/** Adds or edits a site: a boundary (pasted GeoJSON) or a point, crop, bloom window. */
export function SiteForm({ site, growers, onSaved, onCancel, onReload }: SiteFormProps) {
  const create = useCreateSite();
  const update = useUpdateSite();
  const saveFailure = useFormFailure(onReload);
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<SiteFormValues, unknown, SiteCreateRequest>({
    resolver: schemaResolver(siteCreateRequest),
    defaultValues: defaultsFrom(site),
  });

  const submit = handleSubmit(async (values) => {
    saveFailure.clear();
    try {
      const saved = site
        ? await update.mutateAsync({ id: site.id, version: site.version, changes: values })
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
      aria-label={site ? `Edit ${site.name}` : 'Add a site'}
      className="flex max-w-3xl flex-col gap-5"
    >
      <FormAlert
        error={saveFailure.failure}
        unplaced={saveFailure.unplaced}
        onReload={saveFailure.reload}
        reloading={saveFailure.reloading}
      />
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Site name" error={errors.name?.message}>
          <Input {...register('name')} />
        </Field>
        <Field
          label="Grower"
          hint="Leave empty for a honey location of our own"
          error={errors.growerId?.message}
        >
          <Select {...register('growerId', { setValueAs: (v) => v || null })}>
            <option value="">No grower</option>
            {growers.map((g) => (
              <option key={g.id} value={g.id}>
                {g.name}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Kind" error={errors.kind?.message}>
          <Select {...register('kind')}>
            {siteKinds.map((k) => (
              <option key={k} value={k}>
                {siteKindLabels[k]}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Crop" error={errors.crop?.message}>
          <Select {...register('crop')}>
            <option value="">Choose a crop</option>
            {cropOptions.map((c) => (
              <option key={c.value} value={c.value}>
                {c.label}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Bloom starts" hint="Optional" error={errors.bloomStartOn?.message}>
          <Input type="date" {...register('bloomStartOn', asNullableDate)} />
        </Field>
        <Field label="Bloom ends" hint="Optional" error={errors.bloomEndOn?.message}>
          <Input type="date" {...register('bloomEndOn', asNullableDate)} />
        </Field>
      </div>
      <fieldset className="flex flex-col gap-4">
        <legend className="mb-2 text-lg font-semibold text-dusk-50">Where</legend>
        <p className="text-sm text-dusk-300">
          Paste the block's boundary as GeoJSON (the acreage is worked out from it), or give a
          single point.
        </p>
        <Field label="Boundary (GeoJSON Polygon)" error={errors.boundary?.message}>
          <Controller
            control={control}
            name="boundary"
            render={({ field }) => (
              <BoundaryInput value={field.value} onChange={field.onChange} onBlur={field.onBlur} />
            )}
          />
        </Field>
        <div className="grid gap-4 sm:grid-cols-2">
          <Field label="Latitude" error={errors.latitude?.message}>
            <Input
              type="number"
              step="any"
              inputMode="decimal"
              {...register('latitude', asNumber)}
            />
          </Field>
          <Field label="Longitude" error={errors.longitude?.message}>
            <Input
              type="number"
              step="any"
              inputMode="decimal"
              {...register('longitude', asNumber)}
            />
          </Field>
        </div>
      </fieldset>
      <Field
        label="Access notes"
        hint="Gates, turnarounds, where a semi can unload"
        error={errors.accessNotes?.message}
      >
        <Textarea {...register('accessNotes')} />
      </Field>
      <Field label="Notes" error={errors.notes?.message}>
        <Textarea {...register('notes')} />
      </Field>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={isSubmitting}>
          {site ? 'Save' : 'Add site'}
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

import { Controller, useFieldArray, useForm, useWatch } from 'react-hook-form';
import { computeHiveWeight } from '@shared/domain/hive-weight';
import {
  boxSizes,
  hiveSetupCreateRequest,
  type HiveSetupCreateRequest,
} from '@shared/schemas/hive-setups';
import type { Units } from '@shared/schemas/users';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormAlert } from '@/components/ui/form-alert';
import { Input, Select } from '@/components/ui/input';
import { ScaledNumberInput } from '@/components/ui/scaled-number-input';
import { applyServerErrors, schemaResolver } from '@/lib/forms';
import { formatWeight } from '@/lib/units';
import { useCreateHiveSetup } from '../api/create-hive-setup';
import { useUpdateHiveSetup } from '../api/update-hive-setup';
import type { HiveSetup } from '../types';
import { useFormFailure } from '@/hooks/use-form-failure';

const sizeLabels = { deep: 'Deep', medium: 'Medium', shallow: 'Shallow' } as const;
const toPercent = (fill: number) => fill * 100;
const fromPercent = (percent: number) => percent / 100;

/** The estimated weight of a hive of these boxes (with bees, floor and lid), or null. */
export function estimatedWeightKg(
  boxes: HiveSetupCreateRequest['boxes'] | undefined,
): number | null {
  try {
    return boxes && boxes.length ? computeHiveWeight({ boxes }).weightKg : null;
  } catch {
    return null;
  }
}

interface HiveSetupFormProps {
  setup?: HiveSetup;
  units: Units;
  onSaved: (setup: HiveSetup) => void;
  onCancel: () => void;
}

/** Edits a box stack, bottom box first: add or remove boxes, choose size and honey fill. */
export function HiveSetupForm({ setup, units, onSaved, onCancel }: HiveSetupFormProps) {
  const create = useCreateHiveSetup();
  const update = useUpdateHiveSetup();
  const saveFailure = useFormFailure();
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<HiveSetupCreateRequest>({
    resolver: schemaResolver(hiveSetupCreateRequest),
    defaultValues: setup
      ? { name: setup.name, boxes: setup.boxes }
      : { name: '', boxes: [{ size: 'deep', honeyFill: 0.5 }] },
  });
  const boxes = useFieldArray({ control, name: 'boxes' });
  const watched = useWatch({ control, name: 'boxes' });
  const weightKg = estimatedWeightKg(watched);

  const submit = handleSubmit(async (values) => {
    saveFailure.clear();
    try {
      onSaved(
        setup
          ? await update.mutateAsync({ id: setup.id, version: setup.version, changes: values })
          : await create.mutateAsync(values),
      );
    } catch (error) {
      saveFailure.fail(error, applyServerErrors(error, setError, ['name', 'boxes']));
    }
  });

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={setup ? `Edit ${setup.name}` : 'Add a hive setup'}
      className="flex flex-col gap-4"
    >
      <FormAlert error={saveFailure.failure} unplaced={saveFailure.unplaced} />
      <Field label="Setup name" hint="For example: Two deeps" error={errors.name?.message}>
        <Input {...register('name')} />
      </Field>
      <fieldset className="flex flex-col gap-3">
        <legend className="mb-1 font-semibold text-dusk-50">Boxes, bottom first</legend>
        {boxes.fields.map((box, index) => (
          <div
            key={box.id}
            role="group"
            aria-label={`Box ${index + 1}`}
            className="grid grid-cols-[1fr_1fr_auto] items-end gap-2 rounded-md bg-dusk-900 p-3 ring-1 ring-dusk-700"
          >
            <Field label={`Box ${index + 1} size`} error={errors.boxes?.[index]?.size?.message}>
              <Select {...register(`boxes.${index}.size`)}>
                {boxSizes.map((s) => (
                  <option key={s} value={s}>
                    {sizeLabels[s]}
                  </option>
                ))}
              </Select>
            </Field>
            <Field
              label={`Box ${index + 1} honey fill (%)`}
              error={errors.boxes?.[index]?.honeyFill?.message}
            >
              <Controller
                control={control}
                name={`boxes.${index}.honeyFill`}
                render={({ field }) => (
                  <ScaledNumberInput
                    value={field.value}
                    onChange={field.onChange}
                    onBlur={field.onBlur}
                    name={field.name}
                    toDisplay={toPercent}
                    fromDisplay={fromPercent}
                    decimals={0}
                  />
                )}
              />
            </Field>
            <Button
              variant="ghost"
              size="sm"
              onClick={() => boxes.remove(index)}
              disabled={boxes.fields.length === 1}
              aria-label={`Remove box ${index + 1}`}
            >
              Remove
            </Button>
          </div>
        ))}
        {errors.boxes?.message && (
          <p className="text-sm font-medium text-rosehip-300">{errors.boxes.message}</p>
        )}
        <div>
          <Button
            variant="secondary"
            size="sm"
            onClick={() => boxes.append({ size: 'medium', honeyFill: 0.5 })}
            disabled={boxes.fields.length >= 8}
          >
            Add box
          </Button>
        </div>
      </fieldset>
      <p className="text-dusk-200" aria-live="polite">
        Estimated hive weight with bees, floor and lid:{' '}
        <span className="font-semibold text-dusk-50">
          {weightKg === null ? '—' : formatWeight(weightKg, units)}
        </span>
      </p>
      <div className="flex gap-2">
        <Button type="submit" busy={isSubmitting}>
          {setup ? 'Save' : 'Add setup'}
        </Button>
        <Button variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

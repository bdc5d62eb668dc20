import { Controller, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { truckCreateRequest, type TruckCreateRequest } from '@shared/schemas/trucks';
import type { Units } from '@shared/schemas/users';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormAlert } from '@/components/ui/form-alert';
import { Input, Textarea } from '@/components/ui/input';
import { ScaledNumberInput } from '@/components/ui/scaled-number-input';
import { applyServerErrors, asNumber, schemaResolver } from '@/lib/forms';
import { weightFromKg, weightToKg, weightUnit } from '@/lib/units';
import { useCreateTruck } from '../api/create-truck';
import { useUpdateTruck } from '../api/update-truck';
import type { Truck } from '../types';
import { useFormFailure } from '@/hooks/use-form-failure';

type TruckFormValues = z.input<typeof truckCreateRequest>;
const fieldNames = ['name', 'payloadKg', 'palletSpots', 'tiers', 'tareKg', 'legalGrossKg', 'notes'];

interface TruckFormProps {
  truck?: Truck;
  units: Units;
  onSaved: (truck: Truck) => void;
  onCancel: () => void;
}

/** Adds or edits a truck; weights are typed in the user's units and kept in kg. */
export function TruckForm({ truck, units, onSaved, onCancel }: TruckFormProps) {
  const create = useCreateTruck();
  const update = useUpdateTruck();
  const saveFailure = useFormFailure();
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<TruckFormValues, unknown, TruckCreateRequest>({
    resolver: schemaResolver(truckCreateRequest),
    defaultValues: truck
      ? {
          name: truck.name,
          payloadKg: truck.payloadKg,
          palletSpots: truck.palletSpots,
          tiers: truck.tiers,
          tareKg: truck.tareKg,
          legalGrossKg: truck.legalGrossKg,
          notes: truck.notes,
        }
      : { name: '', tiers: 1, notes: '' },
  });
  const unit = weightUnit(units);
  const toShown = (kg: number) => weightFromKg(kg, units);
  const toKg = (shown: number) => weightToKg(shown, units);

  const submit = handleSubmit(async (values) => {
    saveFailure.clear();
    try {
      onSaved(
        truck
          ? await update.mutateAsync({ id: truck.id, version: truck.version, changes: values })
          : await create.mutateAsync(values),
      );
    } catch (error) {
      saveFailure.fail(error, applyServerErrors(error, setError, fieldNames));
    }
  });

  const weight = (name: 'payloadKg' | 'tareKg' | 'legalGrossKg') => (
    <Controller
      control={control}
      name={name}
      render={({ field }) => (
        <ScaledNumberInput
          value={field.value}
          onChange={field.onChange}
          onBlur={field.onBlur}
          name={field.name}
          toDisplay={toShown}
          fromDisplay={toKg}
          decimals={0}
        />
      )}
    />
  );

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={truck ? `Edit ${truck.name}` : 'Add a truck'}
      className="flex flex-col gap-4"
    >
      <FormAlert error={saveFailure.failure} unplaced={saveFailure.unplaced} />
      <Field label="Truck name" error={errors.name?.message}>
        <Input {...register('name')} />
      </Field>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label={`Legal payload (${unit})`} error={errors.payloadKg?.message}>
          {weight('payloadKg')}
        </Field>
        <Field
          label={`Tare (${unit})`}
          hint="Empty truck and trailer"
          error={errors.tareKg?.message}
        >
          {weight('tareKg')}
        </Field>
        <Field label="Pallet spots" error={errors.palletSpots?.message}>
          <Input
            type="number"
            inputMode="numeric"
            step="1"
            {...register('palletSpots', asNumber)}
          />
        </Field>
        <Field label="Tiers" hint="Pallets stacked per spot" error={errors.tiers?.message}>
          <Input type="number" inputMode="numeric" step="1" {...register('tiers', asNumber)} />
        </Field>
        <Field
          label={`Legal gross (${unit})`}
          hint="Empty means the 80,000 lb interstate limit"
          error={errors.legalGrossKg?.message}
        >
          {weight('legalGrossKg')}
        </Field>
      </div>
      <Field label="Notes" error={errors.notes?.message}>
        <Textarea {...register('notes')} />
      </Field>
      <div className="flex gap-2">
        <Button type="submit" busy={isSubmitting}>
          {truck ? 'Save' : 'Add truck'}
        </Button>
        <Button variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

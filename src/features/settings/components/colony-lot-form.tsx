import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import {
  colonyLotCreateRequest,
  queenStatuses,
  type ColonyLotCreateRequest,
} from '@shared/schemas/colony-lots';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormAlert } from '@/components/ui/form-alert';
import { Input, Select, Textarea } from '@/components/ui/input';
import { applyServerErrors, asNumber, schemaResolver } from '@/lib/forms';
import { useCreateColonyLot } from '../api/create-colony-lot';
import { useUpdateColonyLot } from '../api/update-colony-lot';
import type { ColonyLot, HiveSetup } from '../types';
import { useFormFailure } from '@/hooks/use-form-failure';

export const queenStatusLabels: Record<(typeof queenStatuses)[number], string> = {
  'queen-right': 'Queen-right',
  queenless: 'Queenless',
  requeened: 'Requeened',
  unknown: 'Not checked',
};

type LotFormValues = z.input<typeof colonyLotCreateRequest>;

interface ColonyLotFormProps {
  lot?: ColonyLot;
  setups: HiveSetup[];
  onSaved: (lot: ColonyLot) => void;
  onCancel: () => void;
}

/** Adds or edits a colony lot: its name, box setup and colonies per pallet. */
export function ColonyLotForm({ lot, setups, onSaved, onCancel }: ColonyLotFormProps) {
  const create = useCreateColonyLot();
  const update = useUpdateColonyLot();
  const saveFailure = useFormFailure();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<LotFormValues, unknown, ColonyLotCreateRequest>({
    resolver: schemaResolver(colonyLotCreateRequest),
    defaultValues: lot
      ? {
          name: lot.name,
          hiveSetupId: lot.hiveSetupId,
          coloniesPerPallet: lot.coloniesPerPallet,
          queenStatus: lot.queenStatus,
          notes: lot.notes,
        }
      : {
          name: '',
          hiveSetupId: setups[0]?.id ?? '',
          coloniesPerPallet: 4,
          queenStatus: 'queen-right',
          notes: '',
        },
  });
  const submit = handleSubmit(async (values) => {
    saveFailure.clear();
    try {
      onSaved(
        lot
          ? await update.mutateAsync({ id: lot.id, version: lot.version, changes: values })
          : await create.mutateAsync(values),
      );
    } catch (error) {
      saveFailure.fail(
        error,
        applyServerErrors(error, setError, [
          'name',
          'hiveSetupId',
          'coloniesPerPallet',
          'queenStatus',
          'meanFrames',
          'notes',
        ]),
      );
    }
  });
  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={lot ? `Edit ${lot.name}` : 'Add a colony lot'}
      className="flex flex-col gap-4"
    >
      <FormAlert error={saveFailure.failure} unplaced={saveFailure.unplaced} />
      <Field label="Lot name" error={errors.name?.message}>
        <Input {...register('name')} />
      </Field>
      <Field label="Box setup" error={errors.hiveSetupId?.message}>
        <Select {...register('hiveSetupId')}>
          {setups.length === 0 && <option value="">Add a hive setup first</option>}
          {setups.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </Select>
      </Field>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Colonies per pallet" error={errors.coloniesPerPallet?.message}>
          <Input
            type="number"
            inputMode="numeric"
            step="1"
            {...register('coloniesPerPallet', asNumber)}
          />
        </Field>
        <Field label="Queens" error={errors.queenStatus?.message}>
          <Select {...register('queenStatus')}>
            {queenStatuses.map((q) => (
              <option key={q} value={q}>
                {queenStatusLabels[q]}
              </option>
            ))}
          </Select>
        </Field>
      </div>
      <Field label="Notes" error={errors.notes?.message}>
        <Textarea {...register('notes')} />
      </Field>
      <div className="flex gap-2">
        <Button type="submit" busy={isSubmitting}>
          {lot ? 'Save' : 'Add lot'}
        </Button>
        <Button variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

import { Controller, useForm, useWatch } from 'react-hook-form';
import {
  contractCreateRequest,
  contractStatuses,
  type ContractCreateRequest,
} from '@shared/schemas/contracts';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormAlert } from '@/components/ui/form-alert';
import { useFormFailure } from '@/hooks/use-form-failure';
import { Input, Select, Textarea } from '@/components/ui/input';
import { ScaledNumberInput } from '@/components/ui/scaled-number-input';
import { applyServerErrors, asNullableDate, asNumber, schemaResolver } from '@/lib/forms';
import { useCreateContract } from '../api/create-contract';
import { useUpdateContract } from '../api/update-contract';
import type { Contract } from '../types';
import { statusLabels } from '../types';
import { cropOptions } from '@/lib/crops';

type ContractFormValues = ContractCreateRequest;

const fieldNames = [
  'growerId',
  'siteIds',
  'crop',
  'season',
  'status',
  'coloniesOrdered',
  'minFrames',
  'averageFrames',
  'feePerColonyCents',
  'depositCents',
  'deliveryStartOn',
  'deliveryEndOn',
  'removalOn',
  'sprayNoticeHours',
  'terms',
  'internalNotes',
];

const centsToDollars = (cents: number) => cents / 100;
const dollarsToCents = (dollars: number) => Math.round(dollars * 100);

function defaultsFrom(contract?: Contract): Partial<ContractFormValues> {
  if (!contract) {
    return {
      siteIds: [],
      status: 'draft',
      season: new Date().getFullYear() + 1,
      terms: '',
      internalNotes: '',
      removalOn: null,
      averageFrames: null,
    };
  }
  return {
    growerId: contract.growerId,
    siteIds: contract.siteIds,
    crop: contract.crop,
    season: contract.season,
    status: contract.status,
    coloniesOrdered: contract.coloniesOrdered,
    minFrames: contract.minFrames,
    averageFrames: contract.averageFrames,
    feePerColonyCents: contract.feePerColonyCents,
    depositCents: contract.depositCents,
    deliveryStartOn: contract.deliveryStartOn,
    deliveryEndOn: contract.deliveryEndOn,
    removalOn: contract.removalOn,
    sprayNoticeHours: contract.sprayNoticeHours ?? undefined,
    terms: contract.terms,
    internalNotes: contract.internalNotes ?? '',
  };
}

interface ContractFormProps {
  contract?: Contract;
  growers: Array<{ id: string; name: string }>;
  sites: Array<{ id: string; name: string; growerId: string | null }>;
  /** Grower chosen when adding from a grower's page. */
  growerId?: string;
  onSaved: (contract: Contract) => void;
  onCancel?: () => void;
  onReload?: () => Promise<unknown>;
}

/** Adds or edits a pollination contract with the API's own rules (window in order, removal after). */
export function ContractForm({
  contract,
  growers,
  sites,
  growerId,
  onSaved,
  onCancel,
  onReload,
}: ContractFormProps) {
  const create = useCreateContract();
  const update = useUpdateContract();
  const saveFailure = useFormFailure(onReload);
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<ContractFormValues, unknown, ContractFormValues>({
    resolver: schemaResolver(contractCreateRequest),
    defaultValues: { ...defaultsFrom(contract), ...(growerId && !contract ? { growerId } : {}) },
  });
  const chosenGrower = useWatch({ control, name: 'growerId' });
  const growerSites = sites.filter((s) => !s.growerId || s.growerId === chosenGrower);

  const submit = handleSubmit(async (values) => {
    saveFailure.clear();
    try {
      const saved = contract
        ? await update.mutateAsync({ id: contract.id, version: contract.version, changes: values })
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
      aria-label={contract ? 'Edit contract' : 'Add a contract'}
      className="flex max-w-3xl flex-col gap-5"
    >
      <FormAlert
        error={saveFailure.failure}
        unplaced={saveFailure.unplaced}
        onReload={saveFailure.reload}
        reloading={saveFailure.reloading}
      />
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-lg font-semibold text-dusk-50">Who and what</legend>
        <Field label="Grower" error={errors.growerId?.message}>
          <Select {...register('growerId')}>
            <option value="">Choose a grower</option>
            {growers.map((g) => (
              <option key={g.id} value={g.id}>
                {g.name}
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
        <Field label="Season (year)" error={errors.season?.message}>
          <Input type="number" inputMode="numeric" step="1" {...register('season', asNumber)} />
        </Field>
        <Field label="Status" error={errors.status?.message}>
          <Select {...register('status')}>
            {contractStatuses.map((s) => (
              <option key={s} value={s}>
                {statusLabels[s]}
              </option>
            ))}
          </Select>
        </Field>
        <div className="sm:col-span-2">
          <Controller
            control={control}
            name="siteIds"
            render={({ field }) => (
              <fieldset aria-describedby={errors.siteIds ? 'site-ids-error' : undefined}>
                <legend className="text-sm font-medium text-dusk-100">
                  Sites (blocks) under this contract
                </legend>
                {growerSites.length === 0 ? (
                  <p className="mt-1 text-sm text-dusk-300">
                    {chosenGrower
                      ? 'This grower has no sites yet. Add them under Sites.'
                      : 'Choose a grower to see their sites.'}
                  </p>
                ) : (
                  <ul className="mt-2 grid gap-2 sm:grid-cols-2">
                    {growerSites.map((site) => {
                      const checked = field.value?.includes(site.id) ?? false;
                      return (
                        <li key={site.id}>
                          <label className="flex min-h-11 items-center gap-2 rounded-md bg-dusk-950 px-3 ring-1 ring-dusk-600">
                            <input
                              type="checkbox"
                              className="size-5 accent-ember-400"
                              checked={checked}
                              onChange={() =>
                                field.onChange(
                                  checked
                                    ? (field.value ?? []).filter((id) => id !== site.id)
                                    : [...(field.value ?? []), site.id],
                                )
                              }
                            />
                            {site.name}
                          </label>
                        </li>
                      );
                    })}
                  </ul>
                )}
                {errors.siteIds && (
                  <p id="site-ids-error" className="mt-1 text-sm font-medium text-rosehip-300">
                    {errors.siteIds.message ??
                      (errors.siteIds as unknown as Array<{ message?: string }>).find?.(
                        (e) => e?.message,
                      )?.message}
                  </p>
                )}
              </fieldset>
            )}
          />
        </div>
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-3">
        <legend className="mb-2 text-lg font-semibold text-dusk-50">Colonies and strength</legend>
        <Field label="Colonies ordered" error={errors.coloniesOrdered?.message}>
          <Input
            type="number"
            inputMode="numeric"
            step="1"
            {...register('coloniesOrdered', asNumber)}
          />
        </Field>
        <Field label="Minimum frames of bees" error={errors.minFrames?.message}>
          <Input
            type="number"
            inputMode="decimal"
            step="0.5"
            {...register('minFrames', asNumber)}
          />
        </Field>
        <Field label="Average frames of bees" hint="Optional" error={errors.averageFrames?.message}>
          <Input
            type="number"
            inputMode="decimal"
            step="0.5"
            {...register('averageFrames', { setValueAs: (v) => (v === '' ? null : Number(v)) })}
          />
        </Field>
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-3">
        <legend className="mb-2 text-lg font-semibold text-dusk-50">Money</legend>
        <Field label="Fee per colony ($)" error={errors.feePerColonyCents?.message}>
          <Controller
            control={control}
            name="feePerColonyCents"
            render={({ field }) => (
              <ScaledNumberInput
                value={field.value}
                onChange={field.onChange}
                onBlur={field.onBlur}
                name={field.name}
                toDisplay={centsToDollars}
                fromDisplay={dollarsToCents}
              />
            )}
          />
        </Field>
        <Field label="Deposit ($)" hint="Optional" error={errors.depositCents?.message}>
          <Controller
            control={control}
            name="depositCents"
            render={({ field }) => (
              <ScaledNumberInput
                value={field.value}
                onChange={field.onChange}
                onBlur={field.onBlur}
                name={field.name}
                toDisplay={centsToDollars}
                fromDisplay={dollarsToCents}
              />
            )}
          />
        </Field>
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-lg font-semibold text-dusk-50">Dates</legend>
        <Field label="Delivery from" error={errors.deliveryStartOn?.message}>
          <Input type="date" {...register('deliveryStartOn')} />
        </Field>
        <Field label="Delivery by" error={errors.deliveryEndOn?.message}>
          <Input type="date" {...register('deliveryEndOn')} />
        </Field>
        <Field label="Removal" hint="Optional" error={errors.removalOn?.message}>
          <Input type="date" {...register('removalOn', asNullableDate)} />
        </Field>
        <Field
          label="Spray notice (hours ahead)"
          hint="Optional; 48 is common"
          error={errors.sprayNoticeHours?.message}
        >
          <Input
            type="number"
            inputMode="numeric"
            step="1"
            {...register('sprayNoticeHours', asNumber)}
          />
        </Field>
      </fieldset>

      <Field label="Terms the grower sees" error={errors.terms?.message}>
        <Textarea rows={4} {...register('terms')} />
      </Field>
      <Field
        label="Internal notes"
        hint="Never shown to the grower"
        error={errors.internalNotes?.message}
      >
        <Textarea {...register('internalNotes')} />
      </Field>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={isSubmitting}>
          {contract ? 'Save' : 'Add contract'}
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

import { contractStatuses } from '@shared/schemas/contracts';
import { cropKeys, type CropKey } from '@shared/schemas/sites';
import type { ContractStatus } from '@shared/schemas/contracts';
import { Field } from '@/components/ui/field';
import { Select } from '@/components/ui/input';
import type { ContractFilters as Filters } from '../types';
import { statusLabels } from '../types';
import { cropName } from '@/lib/crops';

/** Seasons offered in the filter: a few back and two ahead of this year. */
export function seasonChoices(now = new Date()) {
  const year = now.getFullYear();
  return [year + 2, year + 1, year, year - 1, year - 2, year - 3];
}

/** Status, crop and season filters for the contracts list. */
export function ContractFilters({
  value,
  onChange,
}: {
  value: Filters;
  onChange: (next: Filters) => void;
}) {
  return (
    <div className="grid gap-3 sm:grid-cols-3 lg:max-w-3xl">
      <Field label="Status">
        <Select
          value={value.status ?? ''}
          onChange={(e) =>
            onChange({
              ...value,
              status: (e.target.value || undefined) as ContractStatus | undefined,
            })
          }
        >
          <option value="">Any status</option>
          {contractStatuses.map((s) => (
            <option key={s} value={s}>
              {statusLabels[s]}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Crop">
        <Select
          value={value.crop ?? ''}
          onChange={(e) =>
            onChange({ ...value, crop: (e.target.value || undefined) as CropKey | undefined })
          }
        >
          <option value="">Any crop</option>
          {cropKeys.map((c) => (
            <option key={c} value={c}>
              {cropName(c)}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Season">
        <Select
          value={value.season ? String(value.season) : ''}
          onChange={(e) =>
            onChange({ ...value, season: e.target.value ? Number(e.target.value) : undefined })
          }
        >
          <option value="">Any season</option>
          {seasonChoices().map((y) => (
            <option key={y} value={y}>
              {y}
            </option>
          ))}
        </Select>
      </Field>
    </div>
  );
}

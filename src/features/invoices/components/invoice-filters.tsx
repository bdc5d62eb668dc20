import { invoiceStatuses, type InvoiceStatus } from '@shared/schemas/invoices';
import { Field } from '@/components/ui/field';
import { Select } from '@/components/ui/input';
import type { InvoiceFilters as Filters } from '../types';
import { invoiceStatusLabel } from './invoice-status';

/** State and grower filters of the invoices list. */
export function InvoiceFilters({
  value,
  onChange,
  growers,
}: {
  value: Filters;
  onChange: (next: Filters) => void;
  /** Omitted for a grower, who only ever sees their own. */
  growers?: Array<{ id: string; name: string }>;
}) {
  return (
    <div className="flex flex-wrap gap-3">
      <Field label="State" className="w-52">
        <Select
          value={value.status ?? ''}
          onChange={(e) =>
            onChange({ ...value, status: (e.target.value || undefined) as InvoiceStatus })
          }
        >
          <option value="">Any state</option>
          {invoiceStatuses.map((s) => (
            <option key={s} value={s}>
              {invoiceStatusLabel(s)}
            </option>
          ))}
        </Select>
      </Field>
      {growers && (
        <Field label="Grower" className="w-64">
          <Select
            value={value.growerId ?? ''}
            onChange={(e) => onChange({ ...value, growerId: e.target.value || undefined })}
          >
            <option value="">Every grower</option>
            {growers.map((g) => (
              <option key={g.id} value={g.id}>
                {g.name}
              </option>
            ))}
          </Select>
        </Field>
      )}
    </div>
  );
}

import { createColumnHelper, type ColumnFiltersState } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { cropKeys } from '@shared/schemas/sites';
import type { Units } from '@shared/schemas/users';
import { Field } from '@/components/ui/field';
import { Input, Select } from '@/components/ui/input';
import { DataTable, useClientTable, type Columns } from '@/components/ui/table';
import { paths } from '@/config/paths';
import { cropName } from '@/lib/crops';
import { formatArea, formatDate } from '@/lib/units';
import type { Site } from '../types';
import { siteKindLabels } from '../types';

const column = createColumnHelper<Site>();

/** Sites with grower, crop, acreage in the user's units and bloom window; filter by crop. */
export function SitesTable({
  sites,
  growerNames,
  units,
}: {
  sites: Site[];
  growerNames: Record<string, string>;
  units: Units;
}) {
  const [search, setSearch] = useState('');
  const [crop, setCrop] = useState('');
  const columns = useMemo<Columns<Site>>(
    () => [
      column.accessor('name', {
        header: 'Site',
        cell: (info) => (
          <Link to={paths.site(info.row.original.id)} className="font-medium">
            {info.getValue()}
          </Link>
        ),
      }),
      column.accessor((s) => (s.growerId ? (growerNames[s.growerId] ?? '') : ''), {
        id: 'grower',
        header: 'Grower',
        cell: (info) => info.getValue() || <span className="text-dusk-300">Our own</span>,
      }),
      column.accessor((s) => siteKindLabels[s.kind], { id: 'kind', header: 'Kind' }),
      column.accessor('crop', {
        header: 'Crop',
        filterFn: 'equals',
        cell: (info) => cropName(info.row.original.crop),
      }),
      column.accessor('areaHa', {
        header: 'Area',
        sortUndefined: 'last',
        cell: (info) => formatArea(info.getValue(), units),
      }),
      column.accessor('bloomStartOn', {
        header: 'Bloom',
        sortUndefined: 'last',
        cell: (info) =>
          info.getValue() ? (
            <span className="whitespace-nowrap">
              {formatDate(info.getValue())} – {formatDate(info.row.original.bloomEndOn)}
            </span>
          ) : (
            '—'
          ),
      }),
    ],
    [growerNames, units],
  );
  const columnFilters = useMemo<ColumnFiltersState>(
    () => (crop ? [{ id: 'crop', value: crop }] : []),
    [crop],
  );
  const table = useClientTable(sites, columns, {
    initialSorting: [{ id: 'name', desc: false }],
    globalFilter: search,
    columnFilters,
    searchColumns: ['name', 'grower'],
  });
  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-3 sm:grid-cols-2 lg:max-w-2xl">
        <Field label="Find a site">
          <Input
            type="search"
            value={search}
            onChange={(e) => setSearch(e.target.value)}
            placeholder="Site or grower name"
          />
        </Field>
        <Field label="Crop">
          <Select value={crop} onChange={(e) => setCrop(e.target.value)}>
            <option value="">Any crop</option>
            {cropKeys.map((c) => (
              <option key={c} value={c}>
                {cropName(c)}
              </option>
            ))}
          </Select>
        </Field>
      </div>
      <DataTable
        table={table}
        caption="Sites"
        empty="No site matches. Clear the search or choose another crop."
      />
    </div>
  );
}

import { createColumnHelper, type ColumnFiltersState } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import type { YardView } from '@shared/schemas/yards';
import { paths } from '@/config/paths';
import { Field } from '@/components/ui/field';
import { Input, Select } from '@/components/ui/input';
import { DataTable, useClientTable } from '@/components/ui/table';
import { formatCount, formatDate } from '@/lib/units';

const column = createColumnHelper<YardView>();

const columns = [
  column.accessor('name', {
    header: 'Yard',
    cell: (info) => (
      <Link to={paths.yard(info.row.original.id)} className="font-medium">
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor('colonies', { header: 'Colonies', cell: (info) => formatCount(info.getValue()) }),
  column.accessor((yard) => yard.coloniesBySetup, {
    id: 'setups',
    header: 'By box setup',
    enableSorting: false,
    filterFn: (row, _id, setupId: string) =>
      row.original.coloniesBySetup.some((s) => s.hiveSetupId === setupId && s.colonies > 0),
    cell: (info) =>
      info.getValue().length === 0 ? (
        <span className="text-dusk-300">None here</span>
      ) : (
        <ul className="flex flex-col">
          {info.getValue().map((s) => (
            <li key={s.hiveSetupId}>
              {s.hiveSetupName}: <span className="font-medium">{formatCount(s.colonies)}</span>
            </li>
          ))}
        </ul>
      ),
  }),
  column.accessor('capacity', {
    header: 'Capacity',
    cell: (info) => {
      const yard = info.row.original;
      const full = yard.capacity > 0 ? Math.round((yard.colonies / yard.capacity) * 100) : null;
      return (
        <span>
          {formatCount(yard.capacity)}
          {full !== null && <span className="text-dusk-300"> ({full}% full)</span>}
        </span>
      );
    },
  }),
  column.accessor('lastVisitOn', {
    header: 'Last visit',
    sortUndefined: 'last',
    cell: (info) => formatDate(info.getValue()),
  }),
];

/** All yards with colonies by box setup; sort by any column, filter by name and setup. */
export function YardsTable({ yards }: { yards: YardView[] }) {
  const [search, setSearch] = useState('');
  const [setupId, setSetupId] = useState('');
  const setups = useMemo(() => {
    const seen = new Map<string, string>();
    for (const yard of yards)
      for (const s of yard.coloniesBySetup) seen.set(s.hiveSetupId, s.hiveSetupName);
    return [...seen].sort((a, b) => a[1].localeCompare(b[1]));
  }, [yards]);
  const columnFilters = useMemo<ColumnFiltersState>(
    () => (setupId ? [{ id: 'setups', value: setupId }] : []),
    [setupId],
  );
  const table = useClientTable(yards, columns, {
    initialSorting: [{ id: 'name', desc: false }],
    globalFilter: search,
    columnFilters,
    searchColumns: ['name'],
  });

  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-3 sm:grid-cols-2 lg:max-w-2xl">
        <Field label="Find a yard">
          <Input
            type="search"
            value={search}
            onChange={(e) => setSearch(e.target.value)}
            placeholder="Yard name"
          />
        </Field>
        <Field label="Holding box setup">
          <Select value={setupId} onChange={(e) => setSetupId(e.target.value)}>
            <option value="">Any setup</option>
            {setups.map(([id, name]) => (
              <option key={id} value={id}>
                {name}
              </option>
            ))}
          </Select>
        </Field>
      </div>
      <DataTable
        table={table}
        caption="Yards"
        empty="No yard matches. Clear the search or choose another setup."
      />
    </div>
  );
}

import { createColumnHelper } from '@tanstack/react-table';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { DataTable, useClientTable, type Columns } from '@/components/ui/table';
import { paths } from '@/config/paths';
import type { Grower } from '../types';

const column = createColumnHelper<Grower>();

const columns: Columns<Grower> = [
  column.accessor('name', {
    header: 'Grower',
    cell: (info) => (
      <Link to={paths.grower(info.row.original.id)} className="font-medium">
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor((g) => g.contacts[0]?.name ?? '', {
    id: 'contact',
    header: 'First contact',
    cell: (info) => {
      const first = info.row.original.contacts[0];
      if (!first) return <span className="text-dusk-300">No contacts yet</span>;
      return (
        <span>
          {first.name}
          {first.phone && <span className="block text-sm text-dusk-300">{first.phone}</span>}
        </span>
      );
    },
  }),
  column.accessor((g) => g.contacts.length, { id: 'contacts', header: 'Contacts' }),
];

/** Growers with their first contact; search by grower or contact name. */
export function GrowersTable({ growers }: { growers: Grower[] }) {
  const [search, setSearch] = useState('');
  const table = useClientTable(growers, columns, {
    initialSorting: [{ id: 'name', desc: false }],
    globalFilter: search,
    searchColumns: ['name', 'contact'],
  });
  return (
    <div className="flex flex-col gap-4">
      <Field label="Find a grower" className="sm:max-w-sm">
        <Input
          type="search"
          value={search}
          onChange={(e) => setSearch(e.target.value)}
          placeholder="Grower or contact name"
        />
      </Field>
      <DataTable
        table={table}
        caption="Growers"
        empty="No grower matches. Clear the search to see all."
      />
    </div>
  );
}

import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { Badge } from '@/components/ui/badge';
import { DataTable, useClientTable, type Columns } from '@/components/ui/table';
import { paths } from '@/config/paths';
import { formatCount, formatDate, formatDollars } from '@/lib/units';
import type { Contract } from '../types';
import { statusLabels } from '../types';
import { cropName } from '@/lib/crops';

const column = createColumnHelper<Contract>();

const statusTone = (status: Contract['status']) =>
  status === 'agreed' || status === 'in-bloom'
    ? 'green'
    : status === 'offered' || status === 'draft'
      ? 'amber'
      : status === 'turned-down' || status === 'withdrawn'
        ? 'red'
        : 'neutral';

interface ContractsTableProps {
  contracts: Contract[];
  growerNames: Record<string, string>;
  /** Where a row links to (the grower portal links elsewhere than staff screens). */
  linkTo?: (contract: Contract) => string;
  caption?: string;
}

/** Contracts by grower, crop and season; the fee column appears only when fees are present. */
export function ContractsTable({
  contracts,
  growerNames,
  linkTo = (c) => paths.contract(c.id),
  caption = 'Contracts',
}: ContractsTableProps) {
  const showFees = contracts.some((c) => c.feePerColonyCents !== undefined);
  const columns = useMemo(() => {
    const list: Columns<Contract> = [
      column.accessor((c) => growerNames[c.growerId] ?? 'Unknown grower', {
        id: 'grower',
        header: 'Grower',
        cell: (info) => (
          <Link to={linkTo(info.row.original)} className="font-medium">
            {info.getValue()}
          </Link>
        ),
      }),
      column.accessor((c) => cropName(c.crop), { id: 'crop', header: 'Crop' }),
      column.accessor('season', { header: 'Season' }),
      column.accessor('status', {
        header: 'Status',
        cell: (info) => (
          <Badge tone={statusTone(info.row.original.status)}>
            {statusLabels[info.row.original.status]}
          </Badge>
        ),
      }),
      column.accessor('coloniesOrdered', {
        header: 'Colonies',
        cell: (info) => formatCount(info.getValue()),
      }),
      column.accessor('minFrames', { header: 'Min. frames', cell: (info) => `${info.getValue()}` }),
    ];
    if (showFees) {
      list.push(
        column.accessor((c) => c.feePerColonyCents ?? 0, {
          id: 'fee',
          header: 'Fee per colony',
          cell: (info) => formatDollars(info.row.original.feePerColonyCents),
        }),
      );
    }
    list.push(
      column.accessor('deliveryStartOn', {
        header: 'Delivery',
        cell: (info) => (
          <span className="whitespace-nowrap">
            {formatDate(info.getValue())} – {formatDate(info.row.original.deliveryEndOn)}
          </span>
        ),
      }),
      column.accessor('removalOn', {
        header: 'Removal',
        sortUndefined: 'last',
        cell: (info) => formatDate(info.getValue()),
      }),
    );
    return list;
  }, [growerNames, linkTo, showFees]);
  const table = useClientTable(contracts, columns, {
    initialSorting: [{ id: 'deliveryStartOn', desc: false }],
  });
  return (
    <DataTable
      table={table}
      caption={caption}
      empty="No contracts match these filters. Clear a filter to see more."
    />
  );
}

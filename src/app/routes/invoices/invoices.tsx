import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { invoiceStatuses, type InvoiceStatus } from '@shared/schemas/invoices';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { getContractsQueryOptions } from '@/features/contracts/api/get-contracts';
import { getGrowersQueryOptions } from '@/features/growers/api/get-growers';
import { getInvoicesQueryOptions } from '@/features/invoices/api/get-invoices';
import { BillContractDialog } from '@/features/invoices/components/bill-contract-dialog';
import { InvoiceFilters } from '@/features/invoices/components/invoice-filters';
import { InvoicesTable } from '@/features/invoices/components/invoices-table';
import type { InvoiceFilters as Filters } from '@/features/invoices/types';
import { useUser } from '@/lib/auth';
import { cropName } from '@/lib/crops';
import { requireRole } from '@/lib/route-guards';

/** Filters from the address, so a filtered list can be bookmarked. */
function filtersFrom(params: URLSearchParams): Filters {
  const status = params.get('status');
  const growerId = params.get('growerId');
  return {
    ...(status && (invoiceStatuses as readonly string[]).includes(status)
      ? { status: status as InvoiceStatus }
      : {}),
    ...(growerId ? { growerId } : {}),
  };
}

/** Contracts in these states can be billed (the server says so again, with reasons). */
const billableStatuses = ['agreed', 'in-bloom', 'released'];

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const user = await requireRole(queryClient, request, ['owner', 'planner', 'grower']);
    const filters = filtersFrom(new URL(request.url).searchParams);
    await Promise.all([
      queryClient.ensureQueryData(getInvoicesQueryOptions(filters)),
      queryClient.ensureQueryData(getGrowersQueryOptions()),
      // The contracts the owner may bill, for "Bill a contract".
      user.role === 'owner' ? queryClient.ensureQueryData(getContractsQueryOptions()) : null,
    ]);
    return null;
  };

/** The owner's "Bill a contract" button and its dialog, over the contracts that can be billed. */
function BillAction({ growers }: { growers: Array<{ id: string; name: string }> }) {
  const { data: contracts } = useSuspenseQuery(getContractsQueryOptions());
  const [billing, setBilling] = useState(false);
  const growerNames = new Map(growers.map((g) => [g.id, g.name]));
  const billable = contracts.items
    .filter((c) => billableStatuses.includes(c.status) && !c.archivedAt)
    .map((c) => ({
      id: c.id,
      label: `${growerNames.get(c.growerId) ?? 'Unknown grower'}: ${cropName(c.crop)} ${c.season} (${c.coloniesOrdered} colonies)`,
    }))
    .sort((a, b) => a.label.localeCompare(b.label));
  return (
    <>
      <Button onClick={() => setBilling(true)}>Bill a contract</Button>
      <BillContractDialog open={billing} onClose={() => setBilling(false)} contracts={billable} />
    </>
  );
}

/** /invoices: every invoice (a grower's own only), filtered by state and grower. */
export function InvoicesRoute() {
  const user = useUser();
  const owner = user.role === 'owner';
  const grower = user.role === 'grower';
  const [params, setParams] = useSearchParams();
  const filters = filtersFrom(params);
  const { data } = useSuspenseQuery(getInvoicesQueryOptions(filters));
  const { data: growers } = useSuspenseQuery(getGrowersQueryOptions());
  const filtered = Object.keys(filters).length > 0;

  const setFilters = (next: Filters) => {
    const search = new URLSearchParams();
    for (const [key, value] of Object.entries(next))
      if (value !== undefined) search.set(key, String(value));
    setParams(search, { replace: true });
  };

  return (
    <>
      <PageHeader
        title={grower ? 'Your invoices' : 'Invoices'}
        description={
          grower
            ? `Pollination invoices from ${user.operationName}.`
            : owner
              ? 'Deposits and balances billed from contracts, and what has been paid.'
              : 'Deposits and balances billed from contracts (read only).'
        }
        actions={owner && <BillAction growers={growers.items} />}
      />
      <div className="flex flex-col gap-4">
        <InvoiceFilters
          value={filters}
          onChange={setFilters}
          growers={grower ? undefined : growers.items}
        />
        {data.items.length === 0 && !filtered ? (
          <EmptyState title="No invoices yet">
            {owner
              ? 'Use “Bill a contract” for a deposit once a contract is agreed, and for the balance once the colonies are placed.'
              : grower
                ? 'Invoices appear here once they are sent to you.'
                : 'The owner has not billed any contracts yet.'}
          </EmptyState>
        ) : (
          <InvoicesTable invoices={data.items} />
        )}
      </div>
    </>
  );
}

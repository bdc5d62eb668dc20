import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PageHeader } from '@/components/ui/page-header';
import { useToast } from '@/components/ui/toast';
import { getContractQueryOptions } from '@/features/contracts/api/get-contract';
import { ContractForm } from '@/features/contracts/components/contract-form';
import { getGrowersQueryOptions } from '@/features/growers/api/get-growers';
import { getSitesQueryOptions } from '@/features/sites/api/get-sites';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    await Promise.all([
      queryClient.ensureQueryData(getContractQueryOptions(params.contractId!)),
      queryClient.ensureQueryData(getGrowersQueryOptions()),
      queryClient.ensureQueryData(getSitesQueryOptions()),
    ]);
    return null;
  };

/** /contracts/:contractId/edit */
export function ContractEditRoute() {
  const id = useParams().contractId!;
  const navigate = useNavigate();
  const toast = useToast();
  const { data: contract, refetch } = useSuspenseQuery(getContractQueryOptions(id));
  const { data: growers } = useSuspenseQuery(getGrowersQueryOptions());
  const { data: sites } = useSuspenseQuery(getSitesQueryOptions());
  return (
    <>
      <PageHeader
        title="Edit contract"
        back={<Link to={paths.contract(id)}>← Back to the contract</Link>}
      />
      <ContractForm
        contract={contract}
        growers={growers.items}
        sites={sites.items}
        onReload={refetch}
        onCancel={() => navigate(paths.contract(id))}
        onSaved={() => {
          toast.show('Contract saved.');
          navigate(paths.contract(id));
        }}
      />
    </>
  );
}

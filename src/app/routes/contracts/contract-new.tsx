import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PageHeader } from '@/components/ui/page-header';
import { useToast } from '@/components/ui/toast';
import { ContractForm } from '@/features/contracts/components/contract-form';
import { getGrowersQueryOptions } from '@/features/growers/api/get-growers';
import { getSitesQueryOptions } from '@/features/sites/api/get-sites';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    await Promise.all([
      queryClient.ensureQueryData(getGrowersQueryOptions()),
      queryClient.ensureQueryData(getSitesQueryOptions()),
    ]);
    return null;
  };

/** /contracts/new (?growerId= to start from a grower) */
export function ContractNewRoute() {
  const navigate = useNavigate();
  const toast = useToast();
  const [params] = useSearchParams();
  const { data: growers } = useSuspenseQuery(getGrowersQueryOptions());
  const { data: sites } = useSuspenseQuery(getSitesQueryOptions());
  return (
    <>
      <PageHeader title="Add a contract" back={<Link to={paths.contracts}>← All contracts</Link>} />
      <ContractForm
        growers={growers.items}
        sites={sites.items}
        growerId={params.get('growerId') ?? undefined}
        onCancel={() => navigate(-1)}
        onSaved={(contract) => {
          toast.show('Contract added.');
          navigate(paths.contract(contract.id));
        }}
      />
    </>
  );
}

import type { QueryClient } from '@tanstack/react-query';
import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { Button, ButtonLink } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { FormAlert } from '@/components/ui/form-alert';
import { PageHeader, Section } from '@/components/ui/page-header';
import { Skeleton } from '@/components/ui/skeleton';
import { useToast } from '@/components/ui/toast';
import { useArchiveContract } from '@/features/contracts/api/archive-contract';
import { getContractQueryOptions } from '@/features/contracts/api/get-contract';
import { getContractHistoryQueryOptions } from '@/features/contracts/api/get-contract-history';
import { ContractHistory } from '@/features/contracts/components/contract-history';
import { ContractSummary } from '@/features/contracts/components/contract-summary';
import { DocumentsPanel } from '@/features/documents/components/documents-panel';
import { getGrowersQueryOptions } from '@/features/growers/api/get-growers';
import { getSitesQueryOptions } from '@/features/sites/api/get-sites';
import { canPlan, useUser } from '@/lib/auth';
import { cropName } from '@/lib/crops';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner', 'crew']);
    await Promise.all([
      queryClient.ensureQueryData(getContractQueryOptions(params.contractId!)),
      queryClient.ensureQueryData(getGrowersQueryOptions()),
      queryClient.ensureQueryData(getSitesQueryOptions()),
    ]);
    return null;
  };

/** /contracts/:contractId: the terms, and (for the office) what happened to it. */
export function ContractRoute() {
  const id = useParams().contractId!;
  const user = useUser();
  const planner = canPlan(user);
  const toast = useToast();
  const navigate = useNavigate();
  const { data: contract } = useSuspenseQuery(getContractQueryOptions(id));
  const { data: growers } = useSuspenseQuery(getGrowersQueryOptions());
  const { data: sites } = useSuspenseQuery(getSitesQueryOptions());
  const history = useQuery({ ...getContractHistoryQueryOptions(id), enabled: planner });
  const archive = useArchiveContract();
  const [confirm, setConfirm] = useState(false);
  const growerName =
    growers.items.find((g) => g.id === contract.growerId)?.name ?? 'Unknown grower';
  const siteNames = contract.siteIds.map(
    (sid) => sites.items.find((s) => s.id === sid)?.name ?? 'Archived site',
  );

  return (
    <>
      <PageHeader
        title={`${growerName}: ${cropName(contract.crop)} ${contract.season}`}
        back={<Link to={paths.contracts}>← All contracts</Link>}
        actions={
          planner && (
            <>
              <ButtonLink to={paths.contractEdit(id)}>Edit contract</ButtonLink>
              <Button variant="danger" onClick={() => setConfirm(true)}>
                Archive
              </Button>
            </>
          )
        }
      />
      <div className="grid gap-6 lg:grid-cols-3 lg:items-start">
        <div className="flex flex-col gap-6 lg:col-span-2">
          <Section title="Terms">
            <ContractSummary contract={contract} growerName={growerName} siteNames={siteNames} />
          </Section>
          {/* Written terms can name prices, which crew never see. */}
          {contract.terms && user.role !== 'crew' && (
            <Section title="Written terms">
              <p className="whitespace-pre-line">{contract.terms}</p>
            </Section>
          )}
          {planner && contract.internalNotes && (
            <Section title="Internal notes">
              <p className="whitespace-pre-line">{contract.internalNotes}</p>
            </Section>
          )}
          {/* Contract documents carry prices and terms: crew never see them. */}
          {user.role !== 'crew' && <DocumentsPanel attachedKind="contract" attachedId={id} />}
        </div>
        {planner && (
          <Section title="History">
            {history.isPending ? (
              <Skeleton className="h-24 w-full" />
            ) : history.isError ? (
              <FormAlert error={history.error} />
            ) : (
              <ContractHistory events={history.data.items} />
            )}
          </Section>
        )}
      </div>
      <Dialog open={confirm} title="Archive this contract?" onClose={() => setConfirm(false)}>
        <p>It leaves the contracts list; its history is kept.</p>
        <FormAlert error={archive.error} />
        <div className="mt-4 flex gap-2">
          <Button
            variant="danger"
            busy={archive.isPending}
            onClick={() =>
              archive.mutate(
                { id, version: contract.version },
                {
                  onSuccess: () => {
                    toast.show('Contract archived.');
                    navigate(paths.contracts);
                  },
                },
              )
            }
          >
            Archive contract
          </Button>
          <Button variant="ghost" onClick={() => setConfirm(false)}>
            Keep it
          </Button>
        </div>
      </Dialog>
    </>
  );
}

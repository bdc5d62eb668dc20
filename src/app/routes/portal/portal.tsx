import type { QueryClient } from '@tanstack/react-query';
import { useQuery, useQueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader, Section } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { contractKeys } from '@/features/contracts/api/keys';
import { getContractsQueryOptions } from '@/features/contracts/api/get-contracts';
import { ContractSummary } from '@/features/contracts/components/contract-summary';
import { getGrowersQueryOptions } from '@/features/growers/api/get-growers';
import { getSharedDocumentsQueryOptions } from '@/features/portal/api/get-documents';
import { getPortalInvoicesQueryOptions } from '@/features/portal/api/get-invoices';
import { getProposalsQueryOptions } from '@/features/portal/api/get-proposals';
import { AnsweredProposal } from '@/features/portal/components/answered-proposal';
import { BlockPlacements } from '@/features/portal/components/block-placements';
import { OrchardOutlines } from '@/features/portal/components/orchard-outlines';
import { PendingProposal } from '@/features/portal/components/pending-proposal';
import { PortalInvoices } from '@/features/portal/components/portal-invoices';
import { SharedDocuments } from '@/features/portal/components/shared-documents';
import { getSitesQueryOptions } from '@/features/sites/api/get-sites';
import { getSprayNoticesQueryOptions } from '@/features/spray-notices/api/get-spray-notices';
import { GrowerSprayNotices } from '@/features/spray-notices/components/grower-spray-notices';
import { SprayNoticeForm } from '@/features/spray-notices/components/spray-notice-form';
import { useUnits, useUser } from '@/lib/auth';
import { cropName } from '@/lib/crops';
import { requireRole } from '@/lib/route-guards';
import { formatArea, formatCount } from '@/lib/units';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['grower']);
    await Promise.all([
      queryClient.ensureQueryData(getContractsQueryOptions()),
      queryClient.ensureQueryData(getGrowersQueryOptions()),
      queryClient.ensureQueryData(getSitesQueryOptions()),
      queryClient.ensureQueryData(getProposalsQueryOptions()),
      queryClient.ensureQueryData(getSprayNoticesQueryOptions()),
    ]);
    return null;
  };

/** /portal: the grower's home — blocks, contracts, dates to confirm, spray notices, files. */
export function PortalRoute() {
  const user = useUser();
  const units = useUnits();
  const queryClient = useQueryClient();
  const { data: contractList } = useSuspenseQuery(getContractsQueryOptions());
  const { data: growers } = useSuspenseQuery(getGrowersQueryOptions());
  const { data: siteList } = useSuspenseQuery(getSitesQueryOptions());
  const { data: proposals } = useSuspenseQuery(getProposalsQueryOptions());
  const { data: notices } = useSuspenseQuery(getSprayNoticesQueryOptions());
  const documents = useQuery(getSharedDocumentsQueryOptions());
  const invoices = useQuery(getPortalInvoicesQueryOptions());
  const [filed, setFiled] = useState<string | null>(null);

  const growerName = growers.items[0]?.name ?? user.name;
  const sites = siteList.items.filter((s) => !s.archivedAt);
  const siteName = (id: string) => siteList.items.find((s) => s.id === id)?.name ?? 'Site';
  const contracts = [...contractList.items].sort((a, b) =>
    b.deliveryStartOn.localeCompare(a.deliveryStartOn),
  );
  const contractName = (id: string) => {
    const contract = contracts.find((c) => c.id === id);
    return contract ? `${cropName(contract.crop)} ${contract.season}` : 'Contract';
  };
  // The newest proposal of each contract is the one that matters; older ones were replaced.
  const latestProposal = (contractId: string) =>
    proposals.items.find((p) => p.contractId === contractId);
  const open = proposals.items.filter((p) => p.status === 'open');
  const refreshContracts = () => void queryClient.invalidateQueries({ queryKey: contractKeys.all });

  return (
    <>
      <PageHeader
        title="Your orchards"
        description={`${growerName} with ${user.operationName}: dates, colonies, spray notices and papers.`}
      />
      <div className="flex flex-col gap-6">
        {open.length > 0 && (
          <Section title="Dates to confirm">
            <ul className="flex flex-col gap-4">
              {open.map((proposal) => (
                <li key={proposal.id} className="flex flex-col gap-2">
                  <h3 className="font-semibold text-dusk-100">
                    {contractName(proposal.contractId)}
                  </h3>
                  <PendingProposal
                    proposal={proposal}
                    operationName={user.operationName}
                    onAnswered={refreshContracts}
                  />
                </li>
              ))}
            </ul>
          </Section>
        )}

        <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
          <Section title="Your blocks">
            <OrchardOutlines shapes={sites} />
            <ul className="mt-4 flex flex-col gap-2" aria-label="Blocks">
              {sites.map((site) => {
                const colonies = contracts
                  .filter((c) => c.siteIds.includes(site.id) && c.status !== 'withdrawn')
                  .reduce((sum, c) => sum + c.coloniesOrdered, 0);
                return (
                  <li key={site.id} className="flex flex-wrap justify-between gap-2">
                    <span>
                      <span className="font-medium">{site.name}</span>
                      <span className="text-dusk-300">
                        {' '}
                        · {cropName(site.crop)} · {formatArea(site.areaHa, units)}
                      </span>
                    </span>
                    <span className="text-dusk-200">
                      {colonies > 0 ? `${formatCount(colonies)} colonies contracted` : '—'}
                    </span>
                  </li>
                );
              })}
            </ul>
            <h3 className="mt-5 mb-2 font-semibold text-dusk-100">
              Colonies placed and their strength
            </h3>
            <BlockPlacements />
          </Section>

          <Section title="Contracts">
            {contracts.length === 0 ? (
              <EmptyState title="No contracts yet">
                When {user.operationName} sends you a contract, it will be listed here.
              </EmptyState>
            ) : (
              <ul className="flex flex-col gap-5" aria-label="Your contracts">
                {contracts.map((contract) => {
                  const latest = latestProposal(contract.id);
                  return (
                    <li
                      key={contract.id}
                      data-contract={contract.id}
                      className="flex flex-col gap-2"
                    >
                      <h3 className="font-semibold text-dusk-100">{contractName(contract.id)}</h3>
                      <ContractSummary
                        contract={contract}
                        growerName={growerName}
                        siteNames={contract.siteIds.map(siteName)}
                      />
                      {latest && <AnsweredProposal proposal={latest} />}
                    </li>
                  );
                })}
              </ul>
            )}
          </Section>
        </div>

        <Section title="Spray notices">
          <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
            <div className="flex flex-col gap-3">
              <h3 className="font-semibold text-dusk-100">Warn before you spray</h3>
              {filed && (
                <Alert tone="info" title="Spray notice filed.">
                  {filed}
                </Alert>
              )}
              {sites.length === 0 ? (
                <p className="text-dusk-300">You have no sites to file a notice for.</p>
              ) : (
                <SprayNoticeForm
                  sites={sites}
                  onFiled={(notice) =>
                    setFiled(
                      `${user.operationName} has been told about ${notice.product} at ${siteName(notice.siteId)}.`,
                    )
                  }
                />
              )}
            </div>
            <div className="flex flex-col gap-3">
              <h3 className="font-semibold text-dusk-100">Notices you filed</h3>
              <GrowerSprayNotices notices={notices.items} siteName={siteName} />
            </div>
          </div>
        </Section>

        <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
          <Section title="Documents">
            {documents.isError ? (
              <Alert title="Documents could not be loaded.">{documents.error.message}</Alert>
            ) : (
              <SharedDocuments
                documents={documents.data?.items ?? []}
                attachedTo={(d) =>
                  d.attachedKind === 'contract'
                    ? contractName(d.attachedId)
                    : siteName(d.attachedId)
                }
              />
            )}
          </Section>
          <Section title="Invoices">
            {invoices.isError ? (
              <Alert title="Invoices could not be loaded.">{invoices.error.message}</Alert>
            ) : (
              <PortalInvoices invoices={invoices.data?.items ?? []} invoiceHref={paths.invoice} />
            )}
          </Section>
        </div>
      </div>
    </>
  );
}

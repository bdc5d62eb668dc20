import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { Button, ButtonLink } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { FormAlert } from '@/components/ui/form-alert';
import { Facts, PageHeader, Section } from '@/components/ui/page-header';
import { useToast } from '@/components/ui/toast';
import { DocumentsPanel } from '@/features/documents/components/documents-panel';
import { getGrowersQueryOptions } from '@/features/growers/api/get-growers';
import { getColonyCountsQueryOptions } from '@/features/ledger/api/get-colony-counts';
import { ColonyCountsTable } from '@/features/ledger/components/colony-counts-table';
import { useArchiveSite } from '@/features/sites/api/archive-site';
import { getSiteQueryOptions } from '@/features/sites/api/get-site';
import { SiteOutline } from '@/features/sites/components/site-outline';
import { siteKindLabels } from '@/features/sites/types';
import { useUnits } from '@/lib/auth';
import { cropName } from '@/lib/crops';
import { requireRole } from '@/lib/route-guards';
import { formatArea, formatDate } from '@/lib/units';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner']);
    const id = params.siteId!;
    await Promise.all([
      queryClient.ensureQueryData(getSiteQueryOptions(id)),
      queryClient.ensureQueryData(getGrowersQueryOptions()),
      queryClient.ensureQueryData(getColonyCountsQueryOptions({ placeKind: 'site', placeId: id })),
    ]);
    return null;
  };

/** /sites/:siteId: grower, crop, acreage, bloom, boundary and drops, colonies placed. */
export function SiteRoute() {
  const id = useParams().siteId!;
  const units = useUnits();
  const toast = useToast();
  const navigate = useNavigate();
  const { data: site } = useSuspenseQuery(getSiteQueryOptions(id));
  const { data: growers } = useSuspenseQuery(getGrowersQueryOptions());
  const { data: counts } = useSuspenseQuery(
    getColonyCountsQueryOptions({ placeKind: 'site', placeId: id }),
  );
  const archive = useArchiveSite();
  const [confirm, setConfirm] = useState(false);
  const growerName = site.growerId
    ? (growers.items.find((g) => g.id === site.growerId)?.name ?? 'Unknown grower')
    : 'Our own location';
  const drops = site.drops?.features.length ?? 0;

  return (
    <>
      <PageHeader
        title={site.name}
        back={<Link to={paths.sites}>← All sites</Link>}
        description={`${siteKindLabels[site.kind]} · ${cropName(site.crop)}`}
        actions={
          <>
            <ButtonLink to={paths.siteEdit(id)}>Edit site</ButtonLink>
            <Button variant="danger" onClick={() => setConfirm(true)}>
              Archive
            </Button>
          </>
        }
      />
      <div className="grid gap-6 lg:grid-cols-3 lg:items-start">
        <div className="flex flex-col gap-6 lg:col-span-2">
          <Section title="Site">
            <Facts
              items={[
                ['Grower', growerName],
                ['Crop', cropName(site.crop)],
                ['Area', formatArea(site.areaHa, units)],
                [
                  'Bloom',
                  site.bloomStartOn
                    ? `${formatDate(site.bloomStartOn)} – ${formatDate(site.bloomEndOn)}`
                    : 'Not set',
                ],
                [
                  'Point',
                  site.latitude !== null && site.longitude !== null
                    ? `${site.latitude.toFixed(4)}, ${site.longitude.toFixed(4)}`
                    : '—',
                ],
                ['Drops', drops ? `${drops} drop points` : 'None planned yet'],
              ]}
            />
          </Section>
          <Section title="Colonies here today">
            <ColonyCountsTable
              counts={counts.items}
              placeName={site.name}
              emptyHint="Colonies arrive here with a move."
            />
          </Section>
          <Section title="Access notes">
            <p className="whitespace-pre-line">{site.accessNotes || 'None written yet.'}</p>
          </Section>
          {site.notes && (
            <Section title="Notes">
              <p className="whitespace-pre-line">{site.notes}</p>
            </Section>
          )}
          <DocumentsPanel attachedKind="site" attachedId={id} />
        </div>
        <Section title="Boundary">
          {site.boundary ? (
            <SiteOutline
              boundary={site.boundary}
              drops={site.drops}
              label={`Outline of ${site.name}${drops ? ` with ${drops} drops` : ''}`}
            />
          ) : (
            <p className="text-dusk-300">
              No boundary yet. Edit the site and paste one to get the acreage.
            </p>
          )}
        </Section>
      </div>
      <Dialog open={confirm} title={`Archive ${site.name}?`} onClose={() => setConfirm(false)}>
        <p>It leaves the sites list; contracts and the ledger keep their records.</p>
        <FormAlert error={archive.error} />
        <div className="mt-4 flex gap-2">
          <Button
            variant="danger"
            busy={archive.isPending}
            onClick={() =>
              archive.mutate(
                { id, version: site.version },
                {
                  onSuccess: () => {
                    toast.show(`${site.name} archived.`);
                    navigate(paths.sites);
                  },
                },
              )
            }
          >
            Archive site
          </Button>
          <Button variant="ghost" onClick={() => setConfirm(false)}>
            Keep it
          </Button>
        </div>
      </Dialog>
    </>
  );
}

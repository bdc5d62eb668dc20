import type { QueryClient } from '@tanstack/react-query';
import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { Button, ButtonLink } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Facts, PageHeader, Section } from '@/components/ui/page-header';
import { TableSkeleton } from '@/components/ui/skeleton';
import { useToast } from '@/components/ui/toast';
import { FormAlert } from '@/components/ui/form-alert';
import { DocumentsPanel } from '@/features/documents/components/documents-panel';
import { getColonyCountsQueryOptions } from '@/features/ledger/api/get-colony-counts';
import { getLedgerEntriesQueryOptions } from '@/features/ledger/api/get-ledger-entries';
import { ColonyCountsTable } from '@/features/ledger/components/colony-counts-table';
import { LedgerEntryForm } from '@/features/ledger/components/ledger-entry-form';
import { LedgerHistory } from '@/features/ledger/components/ledger-history';
import { getStrengthSamplesQueryOptions } from '@/features/samples/api/get-strength-samples';
import { getWeightSamplesQueryOptions } from '@/features/samples/api/get-weight-samples';
import { ScaleReadings } from '@/features/samples/components/scale-readings';
import {
  ALMOND_MINIMUM_FRAMES,
  StrengthChecks,
} from '@/features/samples/components/strength-checks';
import { StrengthSampleForm } from '@/features/samples/components/strength-sample-form';
import { WeightSampleForm } from '@/features/samples/components/weight-sample-form';
import { getColonyLotsQueryOptions } from '@/features/settings/api/get-colony-lots';
import { useArchiveYard } from '@/features/yards/api/archive-yard';
import { getYardQueryOptions } from '@/features/yards/api/get-yard';
import { canPlan, isStaff, useUser } from '@/lib/auth';
import { requireRole } from '@/lib/route-guards';
import { formatCount, formatDate } from '@/lib/units';

const weightSamplesOf = (yardId: string) => getWeightSamplesQueryOptions({ yardId });
const strengthSamplesOf = (yardId: string) =>
  getStrengthSamplesQueryOptions({
    placeKind: 'yard',
    placeId: yardId,
    minimumFrames: ALMOND_MINIMUM_FRAMES,
  });

export const loader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner', 'crew']);
    const id = params.yardId!;
    await Promise.all([
      queryClient.ensureQueryData(getYardQueryOptions(id)),
      queryClient.ensureQueryData(getColonyCountsQueryOptions({ placeKind: 'yard', placeId: id })),
      queryClient.ensureQueryData(getColonyLotsQueryOptions()),
    ]);
    // Samples load with the page but do not hold it up; their sections show a skeleton meanwhile.
    void queryClient.prefetchQuery(weightSamplesOf(id));
    void queryClient.prefetchQuery(strengthSamplesOf(id));
    return null;
  };

/** /yards/:yardId: the yard, its colonies by lot, its samples, its ledger, and its notes. */
export function YardRoute() {
  const id = useParams().yardId!;
  const user = useUser();
  const planner = canPlan(user);
  const staff = isStaff(user);
  const toast = useToast();
  const navigate = useNavigate();
  const { data: yard } = useSuspenseQuery(getYardQueryOptions(id));
  const { data: counts } = useSuspenseQuery(
    getColonyCountsQueryOptions({ placeKind: 'yard', placeId: id }),
  );
  const { data: lots } = useSuspenseQuery(getColonyLotsQueryOptions());
  const history = useQuery(getLedgerEntriesQueryOptions({ placeKind: 'yard', placeId: id }));
  const weights = useQuery(weightSamplesOf(id));
  const strength = useQuery(strengthSamplesOf(id));
  const archive = useArchiveYard();
  const [recording, setRecording] = useState(false);
  const [confirmArchive, setConfirmArchive] = useState(false);
  const [sampling, setSampling] = useState<'weights' | 'strength' | null>(null);

  const lotNames = Object.fromEntries(lots.items.map((l) => [l.id, l.name]));
  const lotChoices = lots.items.map((lot) => ({
    id: lot.id,
    name: lot.name,
    coloniesHere: counts.items
      .filter((c) => c.lotId === lot.id)
      .reduce((sum, c) => sum + c.colonies, 0),
  }));
  // The lots here today (from the ledger's counts), for the sample forms.
  const lotsHere = lotChoices.filter((lot) => lot.coloniesHere > 0);
  const sampleRecorded = (summary: string) => {
    setSampling(null);
    toast.show(summary);
  };

  const archiveYard = () =>
    archive.mutate(
      { id: yard.id, version: yard.version },
      {
        onSuccess: () => {
          toast.show(`${yard.name} archived.`);
          navigate(paths.yards);
        },
      },
    );

  return (
    <>
      <PageHeader
        title={yard.name}
        back={<Link to={paths.yards}>← All yards</Link>}
        description={`${formatCount(yard.colonies)} colonies of ${formatCount(yard.capacity)} capacity`}
        actions={
          planner && (
            <>
              <Button onClick={() => setRecording(true)}>Record entry</Button>
              <ButtonLink variant="secondary" to={paths.yardEdit(yard.id)}>
                Edit yard
              </ButtonLink>
              <Button variant="danger" onClick={() => setConfirmArchive(true)}>
                Archive
              </Button>
            </>
          )
        }
      />
      <div className="grid gap-6 lg:grid-cols-3 lg:items-start">
        <div className="flex flex-col gap-6 lg:col-span-2">
          <Section title="Colonies here today">
            <ColonyCountsTable counts={counts.items} placeName={yard.name} />
          </Section>
          <Section
            title="Scale readings"
            actions={
              staff && (
                <Button size="sm" variant="secondary" onClick={() => setSampling('weights')}>
                  Record weights
                </Button>
              )
            }
          >
            {weights.isPending ? (
              <TableSkeleton rows={3} label="Loading scale readings" />
            ) : weights.isError ? (
              <FormAlert error={weights.error} />
            ) : (
              <ScaleReadings samples={weights.data.items} lotNames={lotNames} units={user.units} />
            )}
          </Section>
          <Section
            title="Strength checks"
            actions={
              staff && (
                <Button size="sm" variant="secondary" onClick={() => setSampling('strength')}>
                  Record strength check
                </Button>
              )
            }
          >
            {strength.isPending ? (
              <TableSkeleton rows={3} label="Loading strength checks" />
            ) : strength.isError ? (
              <FormAlert error={strength.error} />
            ) : (
              <StrengthChecks samples={strength.data.items} lotNames={lotNames} />
            )}
          </Section>
          <Section title="Ledger history">
            {history.isPending ? (
              <TableSkeleton rows={4} label="Loading ledger history" />
            ) : history.isError ? (
              <FormAlert error={history.error} />
            ) : (
              <LedgerHistory entries={history.data.items} placeId={yard.id} lotNames={lotNames} />
            )}
          </Section>
          <DocumentsPanel attachedKind="yard" attachedId={yard.id} />
        </div>
        <div className="flex flex-col gap-6">
          <Section title="Yard">
            <Facts
              items={[
                ['Location', `${yard.latitude.toFixed(4)}, ${yard.longitude.toFixed(4)}`],
                ['Capacity', `${formatCount(yard.capacity)} colonies`],
                ['Last visit', formatDate(yard.lastVisitOn)],
              ]}
            />
          </Section>
          <Section title="Access notes">
            <p className="whitespace-pre-line text-dusk-100">
              {yard.accessNotes || 'None written yet.'}
            </p>
          </Section>
          <Section title="Notes">
            <p className="whitespace-pre-line text-dusk-100">{yard.notes || 'None written yet.'}</p>
          </Section>
        </div>
      </div>

      <Dialog
        open={recording}
        title={`Record an entry at ${yard.name}`}
        onClose={() => setRecording(false)}
      >
        <LedgerEntryForm
          place={{ kind: 'yard', id: yard.id }}
          placeName={yard.name}
          lots={lotChoices}
          onCancel={() => setRecording(false)}
          onRecorded={(summary) => {
            setRecording(false);
            toast.show(`Recorded: ${summary}`);
          }}
        />
      </Dialog>
      <Dialog
        open={sampling === 'weights'}
        title={`Record hive weights at ${yard.name}`}
        onClose={() => setSampling(null)}
      >
        <WeightSampleForm
          yardId={yard.id}
          yardName={yard.name}
          lots={lotsHere}
          units={user.units}
          onCancel={() => setSampling(null)}
          onRecorded={sampleRecorded}
        />
      </Dialog>
      <Dialog
        open={sampling === 'strength'}
        title={`Record a strength check at ${yard.name}`}
        onClose={() => setSampling(null)}
      >
        <StrengthSampleForm
          yardId={yard.id}
          yardName={yard.name}
          lots={lotsHere}
          onCancel={() => setSampling(null)}
          onRecorded={sampleRecorded}
        />
      </Dialog>
      <Dialog
        open={confirmArchive}
        title={`Archive ${yard.name}?`}
        onClose={() => setConfirmArchive(false)}
      >
        <p className="text-dusk-100">
          The yard leaves the list. Its ledger stays as it is.{' '}
          {yard.colonies > 0 && `It still holds ${formatCount(yard.colonies)} colonies.`}
        </p>
        <FormAlert error={archive.error} />
        <div className="mt-4 flex gap-2">
          <Button variant="danger" onClick={archiveYard} busy={archive.isPending}>
            Archive yard
          </Button>
          <Button variant="ghost" onClick={() => setConfirmArchive(false)}>
            Keep it
          </Button>
        </div>
      </Dialog>
    </>
  );
}

import type { QueryClient } from '@tanstack/react-query';
import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@/config/paths';
import { ButtonLink } from '@/components/ui/button';
import { FormAlert } from '@/components/ui/form-alert';
import { Facts, PageHeader, Section } from '@/components/ui/page-header';
import { TableSkeleton } from '@/components/ui/skeleton';
import { DocumentsPanel } from '@/features/documents/components/documents-panel';
import { getLoadSheetQueryOptions } from '@/features/moves/api/get-load-sheet';
import { getMoveQueryOptions } from '@/features/moves/api/get-move';
import { CrewRecordsTable } from '@/features/moves/components/crew-records-table';
import { LoadSheetTable } from '@/features/moves/components/load-sheet-table';
import { MoveStatusActions } from '@/features/moves/components/move-status-actions';
import { MoveStatusBadge } from '@/features/moves/components/move-status';
import { MoveTimeline } from '@/features/moves/components/move-timeline';
import { MoveCautions, MoveWarnings } from '@/features/moves/components/move-warnings';
import { canPlan, useUser } from '@/lib/auth';
import { requireRole } from '@/lib/route-guards';
import { formatCount, formatDate } from '@/lib/units';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner', 'crew']);
    const id = params.moveId!;
    await queryClient.ensureQueryData(getMoveQueryOptions(id));
    void queryClient.prefetchQuery(getLoadSheetQueryOptions(id));
    return null;
  };

/** /moves/:moveId: the move's load sheet summary, timeline, warnings and status actions. */
export function MoveRoute() {
  const id = useParams().moveId!;
  const user = useUser();
  const planner = canPlan(user);
  const { data: move, refetch } = useSuspenseQuery(getMoveQueryOptions(id));
  const sheet = useQuery(getLoadSheetQueryOptions(id));
  const colonies = move.origins.reduce((sum, o) => sum + o.colonies, 0);
  const recorded = move.loads.reduce((sum, l) => sum + (l.palletsLoaded ?? 0), 0);
  const placed = move.loads.reduce((sum, l) => sum + (l.coloniesPlaced ?? 0), 0);
  const editable = planner && (move.status === 'draft' || move.status === 'planned');
  return (
    <>
      <PageHeader
        title={move.name}
        back={<Link to={paths.moves}>← All moves</Link>}
        description={
          <span className="flex flex-wrap items-center gap-2">
            <MoveStatusBadge status={move.status} /> Night of {formatDate(move.nightOf)} ·{' '}
            {formatCount(colonies)} colonies on {move.loads.length} truck
            {move.loads.length === 1 ? '' : 's'}
          </span>
        }
        actions={
          <>
            {editable && (
              <ButtonLink variant="secondary" to={paths.moveEdit(id)}>
                Edit the plan
              </ButtonLink>
            )}
            <ButtonLink variant="secondary" to={paths.movePrint(id)}>
              Print load sheets
            </ButtonLink>
          </>
        }
      />
      <div className="mb-6">
        <MoveStatusActions move={move} canPlan={planner} onReload={() => void refetch()} />
      </div>
      <div className="grid gap-6 lg:grid-cols-3 lg:items-start">
        <div className="flex flex-col gap-6 lg:col-span-2">
          {sheet.isPending ? (
            <TableSkeleton rows={4} label="Loading the load sheet" />
          ) : sheet.isError ? (
            <FormAlert error={sheet.error} />
          ) : (
            <>
              <Section title="Warnings">
                <MoveWarnings warnings={sheet.data.warnings} />
              </Section>
              <Section title="Load sheet">
                {sheet.data.planSource === 'computed-now' && (
                  <p className="mb-2 text-sm text-dusk-300">
                    Worked out now: this move was saved without a plan.
                  </p>
                )}
                <LoadSheetTable
                  trucks={sheet.data.pages}
                  totals={sheet.data.totals}
                  units={user.units}
                  destinationZone={sheet.data.timeline.window?.destination.timeZone}
                />
              </Section>
              <Section title="Crew records by truck and yard">
                <CrewRecordsTable pages={sheet.data.pages} />
              </Section>
              <Section title="Timeline">
                <MoveTimeline timeline={sheet.data.timeline} />
              </Section>
            </>
          )}
          <DocumentsPanel attachedKind="move" attachedId={id} />
        </div>
        <div className="flex flex-col gap-6">
          <Section title="Crew records">
            <Facts
              items={[
                ['Pallets loaded', recorded ? formatCount(recorded) : 'None yet'],
                ['Colonies placed', placed ? formatCount(placed) : 'None yet'],
                ['Drivers per truck', move.drivers === 2 ? 'A team of two' : 'One'],
                ['Loading', `${move.loadingMinutes} min`],
              ]}
            />
          </Section>
          {sheet.data && (
            <Section title="Cautions">
              <MoveCautions cautions={sheet.data.cautions} compact />
            </Section>
          )}
          <Section title="Notes">
            <p className="whitespace-pre-line text-dusk-100">{move.notes || 'None written.'}</p>
          </Section>
        </div>
      </div>
    </>
  );
}

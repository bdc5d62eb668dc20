import type { Units } from '@shared/schemas/users';
import { Section } from '@/components/ui/page-header';
import { FormAlert } from '@/components/ui/form-alert';
import type { MovePlan } from '../types';
import { LoadSheetTable } from './load-sheet-table';
import { MoveTimeline } from './move-timeline';
import { MoveCautions, MoveWarnings } from './move-warnings';

/** The plan as it stands: warnings, load sheet, timeline, cautions and assumptions. */
export function PlanPreview({
  plan,
  units,
  updating,
  error,
}: {
  plan: MovePlan | undefined;
  units: Units;
  updating?: boolean;
  error?: unknown;
}) {
  return (
    <div className="flex flex-col gap-4" aria-busy={updating || undefined}>
      {error ? <FormAlert error={error} /> : null}
      {!plan ? (
        <p className="rounded-lg bg-dusk-850 p-4 text-dusk-300 ring-1 ring-dusk-700">
          Choose the night, a destination and colonies from at least one yard: the load sheet and
          the timeline appear here as you go.
        </p>
      ) : (
        <>
          <Section
            title="Warnings"
            actions={updating && <span className="text-sm text-dusk-300">Updating…</span>}
          >
            <MoveWarnings warnings={plan.warnings} />
          </Section>
          <Section title="Load sheet">
            <LoadSheetTable
              trucks={plan.loadSheet.trucks}
              totals={plan.loadSheet.totals}
              units={units}
              destinationZone={plan.timeline.window?.destination.timeZone}
            />
          </Section>
          <Section title="Timeline">
            <MoveTimeline timeline={plan.timeline} />
          </Section>
          <Section title="Cautions">
            <MoveCautions cautions={plan.cautions} compact />
          </Section>
          {plan.assumptions.length > 0 && (
            <details className="text-sm text-dusk-300">
              <summary className="cursor-pointer">How this was worked out</summary>
              <ul className="mt-2 list-disc pl-5">
                {plan.assumptions.map((a) => (
                  <li key={a}>{a}</li>
                ))}
              </ul>
            </details>
          )}
        </>
      )}
    </div>
  );
}

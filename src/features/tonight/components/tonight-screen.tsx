import { useEffect, useState } from 'react';
import type { MoveStatus } from '@shared/schemas/moves';
import type { Units } from '@shared/schemas/users';
import { preRollMissing } from '@shared/domain/pre-roll-check';
import { useTonight } from '../api/get-tonight';
import { applyPending } from '../lib/apply-pending';
import { useQueueState, useTonightDevice } from '../lib/tonight-context';
import type { NewChange } from '../lib/offline-queue';
import type { TonightMove } from '../types';
import { LoadCard } from './load-card';
import { SyncBar } from './sync-bar';
import './tonight.css';

const NIGHT_VISION_KEY = 'duskhaul.tonight.nightVision';

/** Night vision is on unless the crew turned it off on this device. */
function useNightVision() {
  const [on, setOn] = useState(() => {
    try {
      return localStorage.getItem(NIGHT_VISION_KEY) !== 'off';
    } catch {
      return true;
    }
  });
  useEffect(() => {
    try {
      localStorage.setItem(NIGHT_VISION_KEY, on ? 'on' : 'off');
    } catch {
      // Private mode: remembered for this visit only.
    }
    document.documentElement.classList.toggle('tn-night-page', on);
    return () => document.documentElement.classList.remove('tn-night-page');
  }, [on]);
  return [on, setOn] as const;
}

const nextStep: Partial<Record<MoveStatus, { status: MoveStatus; label: string }>> = {
  planned: { status: 'loading', label: 'Start loading' },
  loading: { status: 'rolling', label: 'Rolling' },
  rolling: { status: 'placed', label: 'Placed' },
};

const statusWords: Partial<Record<MoveStatus, string>> = {
  planned: 'Planned',
  loading: 'Loading',
  rolling: 'Rolling',
  placed: 'Placed',
};

function MoveSection({
  move,
  units,
  onChange,
}: {
  move: TonightMove;
  units: Units;
  onChange: (change: NewChange) => void;
}) {
  const step = nextStep[move.status];
  // Not a lock: the crew may have checked on paper, but they see which trucks are open.
  const unchecked =
    step?.status === 'rolling'
      ? move.loads.filter((l) => preRollMissing(l.recorded.preRollCheck).length > 0)
      : [];
  return (
    <section className="flex flex-col gap-3" aria-label={move.name} data-move={move.id}>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <div>
          <h2 className="text-2xl font-semibold">{move.name}</h2>
          <p className="tn-muted">
            Night of {move.nightOf} · to {move.destinations.map((d) => d.name).join(', ')} ·{' '}
            <span data-testid="move-status">{statusWords[move.status] ?? move.status}</span>
          </p>
        </div>
        {step && (
          <button
            type="button"
            className="tn-button tn-button-primary tn-big px-6 text-xl"
            onClick={() =>
              onChange({
                kind: 'status',
                moveId: move.id,
                baseVersion: move.version,
                payload: { status: step.status },
                label: `${move.name}: ${step.label.toLowerCase()}`,
              })
            }
          >
            {step.label}
          </button>
        )}
      </div>
      {unchecked.length > 0 && (
        <p className="tn-alert rounded-lg border-2 p-3" role="note">
          Pre-roll check not kept for {unchecked.map((l) => l.truckName).join(', ')}. Walk round
          each truck before it rolls.
        </p>
      )}
      {move.destinations.some((d) => d.accessNotes) && (
        <ul className="tn-muted text-sm">
          {move.destinations
            .filter((d) => d.accessNotes)
            .map((d) => (
              <li key={d.id}>
                {d.name}: {d.accessNotes}
              </li>
            ))}
        </ul>
      )}
      <div className="grid gap-4 md:grid-cols-2">
        {move.loads.map((load) => (
          <LoadCard key={load.loadId} move={move} load={load} units={units} onChange={onChange} />
        ))}
      </div>
    </section>
  );
}

/** Tonight: the crew's night on a phone, kept on the device and synced when there is signal. */
export function TonightScreen({ today, units }: { today: string; units: Units }) {
  const { storage, queue } = useTonightDevice();
  const tonight = useTonight(today, storage);
  const queueState = useQueueState();
  const [nightVision, setNightVision] = useNightVision();

  const change = (input: NewChange) =>
    void queue.enqueue(input).then(() => {
      // Quick taps merge into one change; send shortly after the last one.
      window.clearTimeout(sendTimer);
      sendTimer = window.setTimeout(() => void queue.sync(), 800);
    });

  // Someone else's changes left on the phone are not laid over this person's view.
  const mine = queueState.changes.filter((c) => !queue.isOthers(c));
  const moves = tonight.data ? applyPending(tonight.data.moves, mine) : [];
  const cautions = new Map(moves.flatMap((m) => m.cautions).map((c) => [c.code, c]));

  return (
    <div
      className={`tonight ${nightVision ? 'night-vision' : ''} -mx-4 -my-6 min-h-screen px-4 py-5`}
    >
      <div className="mx-auto flex max-w-3xl flex-col gap-4">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h1 className="text-3xl font-semibold">Tonight</h1>
          <label className="flex min-h-12 items-center gap-3">
            <input
              type="checkbox"
              className="size-7"
              checked={nightVision}
              onChange={(e) => setNightVision(e.target.checked)}
            />
            Night vision (red on black)
          </label>
        </div>
        <details className="tn-surface p-3 text-sm" open>
          <summary className="cursor-pointer font-semibold">Before you lift and roll</summary>
          <ul className="mt-2 flex list-disc flex-col gap-1 pl-5">
            <li>
              Heat in a stopped load kills bees fast: keep moving; at a stop, park in shade and wet
              the load.
            </li>
            <li>Nets on, clipped and strapped, with air moving through the load.</li>
            <li>Lift with the loader or a second pair of hands, never a full hive alone.</li>
            {[...cautions.values()]
              .filter((c) => c.code === 'cold-night' || c.code === 'heat-stopped-load')
              .map((c) => (
                <li key={c.code}>{c.message}</li>
              ))}
          </ul>
          <p className="tn-muted mt-2">State rules and licensed practice come first.</p>
        </details>
        <SyncBar />
        {tonight.isPending ? (
          <p className="tn-muted">Loading tonight's moves…</p>
        ) : tonight.isError ? (
          <p className="tn-alert">
            Tonight's moves could not be loaded and none are kept on this phone yet. Open Tonight
            once with signal before heading out.
          </p>
        ) : moves.length === 0 ? (
          <p className="tn-muted">No moves planned for tonight or tomorrow night.</p>
        ) : (
          <>
            {tonight.data.upcoming && (
              <p className="tn-muted">
                Nothing on tonight or tomorrow. Next night with moves: {tonight.data.nights[0]}.
              </p>
            )}
            <p className="tn-muted text-sm">
              Kept on this phone {new Date(tonight.data.fetchedAt).toLocaleTimeString()}.
            </p>
            {moves.map((move) => (
              <MoveSection key={move.id} move={move} units={units} onChange={change} />
            ))}
          </>
        )}
      </div>
    </div>
  );
}

let sendTimer = 0;

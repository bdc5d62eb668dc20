import { waitingLabel } from '../lib/apply-pending';
import { useOnline, useQueueState, useTonightDevice } from '../lib/tonight-context';

/** What waits to be sent, the retry button, and every conflict or refusal until dealt with. */
export function SyncBar() {
  const { queue } = useTonightDevice();
  const state = useQueueState();
  const online = useOnline();
  const others = state.changes.filter(queue.isOthers);
  const waiting = state.changes.filter((c) => c.state === 'waiting' && !queue.isOthers(c));
  const problems = state.changes.filter((c) => c.state !== 'waiting' && !queue.isOthers(c));
  return (
    <div className="flex flex-col gap-3">
      <div
        className="tn-surface flex flex-wrap items-center gap-3 p-3"
        role="status"
        aria-live="polite"
      >
        <span className="font-semibold" data-testid="sync-status">
          {waiting.length > 0
            ? waitingLabel(waiting.length)
            : state.syncing
              ? 'Sending…'
              : problems.length > 0
                ? // Not "everything is sent" while the office has turned something away.
                  `${problems.length} ${problems.length === 1 ? 'change' : 'changes'} the office did not take`
                : 'Everything is sent'}
        </span>
        {(!online || state.unreachable) && (
          <span className="tn-alert rounded border px-2 py-0.5 text-sm">
            No signal: changes stay on this phone
          </span>
        )}
        {waiting.length > 0 && (
          <button
            type="button"
            className="tn-button ml-auto"
            disabled={state.syncing}
            onClick={() => void queue.sync()}
          >
            {state.syncing ? 'Sending…' : 'Send now'}
          </button>
        )}
      </div>
      {others.length > 0 && (
        <section
          className="tn-surface flex flex-col gap-3 border-2 tn-line p-3"
          aria-label="Changes someone else left on this phone"
        >
          <h2 className="text-lg font-semibold">
            Left on this phone by someone else: {others.length}
          </h2>
          <p className="tn-muted text-sm">
            They go to the office only when the person who made them signs in here again.
          </p>
          {others.map((c) => (
            <div
              key={c.idempotencyKey}
              className="flex flex-wrap items-center justify-between gap-2 border-t tn-line pt-2"
            >
              <p>{c.label}</p>
              <button
                type="button"
                className="tn-button"
                onClick={() => void queue.discard(c.idempotencyKey)}
              >
                Discard
              </button>
            </div>
          ))}
        </section>
      )}
      {problems.length > 0 && (
        <section
          className="tn-surface tn-alert flex flex-col gap-3 border-2 p-3"
          aria-label="Changes the office did not take"
        >
          <h2 className="text-lg font-semibold">Not sent: {problems.length} need you</h2>
          {problems.map((c) => (
            <div
              key={c.idempotencyKey}
              className="flex flex-col gap-2 border-t tn-line pt-2"
              data-conflict={c.kind}
            >
              <p className="font-semibold">{c.label}</p>
              <p>
                {c.state === 'conflict'
                  ? `Someone changed this first. ${c.message ?? ''}`
                  : `Refused: ${c.message ?? ''}`}
              </p>
              {c.current && <CurrentRecord record={c.current} />}
              <div className="flex flex-wrap gap-2">
                {c.state === 'conflict' && (
                  <button
                    type="button"
                    className="tn-button tn-button-primary"
                    onClick={() => void queue.redo(c.idempotencyKey).then(() => queue.sync())}
                  >
                    Redo mine on top
                  </button>
                )}
                <button
                  type="button"
                  className="tn-button"
                  onClick={() => void queue.discard(c.idempotencyKey)}
                >
                  Discard mine
                </button>
              </div>
            </div>
          ))}
        </section>
      )}
    </div>
  );
}

const shown: Array<[string, string]> = [
  ['status', 'Status'],
  ['palletsLoaded', 'Pallets loaded'],
  ['coloniesPlaced', 'Colonies placed'],
  ['coloniesLeftBehind', 'Left behind'],
  ['coloniesLost', 'Lost'],
  ['version', 'Version'],
];

/** The server's record as it is now, the fields the crew cares about. */
function CurrentRecord({ record }: { record: Record<string, unknown> }) {
  const rows = shown.filter(([key]) => record[key] !== undefined);
  return (
    <dl className="grid grid-cols-2 gap-x-4 text-sm" aria-label="The office's record now">
      {rows.map(([key, label]) => (
        <div key={key} className="contents">
          <dt className="tn-muted">{label}</dt>
          <dd>{record[key] === null ? '—' : String(record[key])}</dd>
        </div>
      ))}
    </dl>
  );
}

import { useState } from 'react';
import type { Units } from '@shared/schemas/users';
import type { PreRollCheck } from '@shared/schemas/moves';
import { formatLocalTime } from '@shared/domain/local-time';
import { recordedAtStop, type StopRef } from '@shared/domain/pick-up-stops';
import { preRollItems, preRollMissing, type PreRollItem } from '@shared/domain/pre-roll-check';
import { weightToKg, weightUnit } from '@/lib/units';
import type { NewChange } from '../lib/offline-queue';
import type { TonightLoad, TonightMove } from '../types';
import { Counter } from './counter';

interface Props {
  move: TonightMove;
  load: TonightLoad;
  units: Units;
  onChange: (change: NewChange) => void;
}

/** A moment recorded on the phone, in the phone's own time. */
const deviceClock = (iso: string) =>
  new Date(iso).toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' });

const numberOrNull = (text: string) =>
  text.trim() === '' ? null : Math.max(0, Math.floor(Number(text)) || 0);

/** A whole-number field with the phone's number pad. */
function CountInput({
  label,
  value,
  max,
  onChange,
}: {
  label: string;
  value: string;
  max?: number;
  onChange: (value: string) => void;
}) {
  return (
    <label className="flex flex-col gap-1">
      <span>{label}</span>
      <input
        className="tn-input"
        type="number"
        min={0}
        max={max}
        inputMode="numeric"
        value={value}
        onChange={(e) => onChange(e.target.value)}
      />
    </label>
  );
}

/** One truck tonight: pick-ups, pallets loaded, weights, notes, and what was placed or lost. */
export function LoadCard({ move, load, units, onChange }: Props) {
  const recorded = load.recorded;
  const counts = (payload: Record<string, unknown>, label: string) =>
    onChange({
      kind: 'load-counts',
      moveId: move.id,
      loadId: load.loadId,
      baseVersion: recorded.version,
      payload,
      label: `${load.truckName}: ${label}`,
    });

  // Pallets are counted per pick-up stop; a truck total recorded without stops (by the office, or
  // an older phone) stands for the only stop of a one-stop truck.
  const byStop = recorded.palletsByStop;
  const loadedAt = (stop: StopRef) =>
    recordedAtStop(byStop, recorded.palletsLoaded, load.stops, stop, (c) => c.pallets) ?? 0;
  const loadedTotal = byStop
    ? byStop.reduce((sum, c) => sum + c.pallets, 0)
    : (recorded.palletsLoaded ?? 0);
  const countAt = (index: number, value: number) => {
    const palletsByStop = load.stops.map((stop, i) => ({
      yardId: stop.yardId,
      lotId: stop.lotId,
      pallets: i === index ? value : loadedAt(stop),
    }));
    const palletsLoaded = palletsByStop.reduce((sum, c) => sum + c.pallets, 0);
    counts(
      { palletsByStop, palletsLoaded },
      `${value} ${value === 1 ? 'pallet' : 'pallets'} loaded at ${load.stops[index].yardName}`,
    );
  };

  const [check, setCheck] = useState<Record<PreRollItem, boolean>>(
    () =>
      Object.fromEntries(
        preRollItems.map(({ item }) => [item, recorded.preRollCheck?.[item] === true]),
      ) as Record<PreRollItem, boolean>,
  );
  const saveCheck = () => {
    const preRollCheck: PreRollCheck = { ...check, checkedAt: new Date().toISOString() };
    const ticked = preRollItems.length - preRollMissing(preRollCheck).length;
    counts({ preRollCheck }, `pre-roll check, ${ticked} of ${preRollItems.length} ticked`);
    setSaidSaved('Pre-roll check kept.');
  };
  const checkMissing = preRollMissing(recorded.preRollCheck);

  const placedAt = (placeId: string) =>
    recorded.placements?.find((p) => p.placeId === placeId)?.colonies ?? null;
  const [placed, setPlaced] = useState<Record<string, string>>(() =>
    Object.fromEntries(move.destinations.map((d) => [d.id, String(placedAt(d.id) ?? '')])),
  );
  const [drops, setDrops] = useState<Record<string, string>>(() =>
    Object.fromEntries(
      move.destinations.map((d) => [
        d.id,
        recorded.placements?.find((p) => p.placeId === d.id)?.drop ?? '',
      ]),
    ),
  );
  // Colonies left behind are counted per pick-up stop, so the ledger keeps them in their yard; a
  // truck total recorded without stops stands for the only stop of a one-stop truck.
  const leftByStop = recorded.leftBehindByStop;
  const leftAt = (stop: StopRef) =>
    recordedAtStop(leftByStop, recorded.coloniesLeftBehind, load.stops, stop, (c) => c.colonies);
  const [leftBehind, setLeftBehind] = useState<string[]>(() =>
    load.stops.map((stop) => String(leftAt(stop) ?? '')),
  );
  const truckTotalOnly =
    !leftByStop && recorded.coloniesLeftBehind !== null && load.stops.length > 1;
  const [leftOnTruck, setLeftOnTruck] = useState(String(recorded.coloniesLeftBehind ?? ''));
  const [lost, setLost] = useState(String(recorded.coloniesLost ?? ''));
  const [weightStop, setWeightStop] = useState(0);
  const [weights, setWeights] = useState('');
  const [note, setNote] = useState('');
  const [saidSaved, setSaidSaved] = useState<string | null>(null);

  const leftBehindFields = () => {
    if (load.stops.length === 0) return { coloniesLeftBehind: numberOrNull(leftOnTruck) };
    if (leftBehind.every((text) => text.trim() === '')) {
      // A truck total from before stays until it is given by yard.
      return truckTotalOnly ? {} : { coloniesLeftBehind: null, leftBehindByStop: null };
    }
    const leftBehindByStop = load.stops.map((stop, i) => ({
      yardId: stop.yardId,
      lotId: stop.lotId,
      colonies: numberOrNull(leftBehind[i]) ?? 0,
    }));
    const coloniesLeftBehind = leftBehindByStop.reduce((sum, c) => sum + c.colonies, 0);
    return { coloniesLeftBehind, leftBehindByStop };
  };
  /** "Salt Lick", or "Salt Lick (Two deeps)" when the truck takes two lots from that yard. */
  const stopName = (stop: TonightLoad['stops'][number]) =>
    load.stops.filter((s) => s.yardId === stop.yardId).length > 1
      ? `${stop.yardName} (${stop.lotName})`
      : stop.yardName;

  const savePlacements = () => {
    // Nothing typed at any drop: the truck's placed counts are left as they are (not zero), so
    // left-behind and lost can be kept before the drop.
    const anyPlaced = move.destinations.some((d) => (placed[d.id] ?? '').trim() !== '');
    const placements = move.destinations
      .map((d) => ({
        placeId: d.id,
        ...(drops[d.id]?.trim() ? { drop: drops[d.id].trim() } : {}),
        colonies: numberOrNull(placed[d.id] ?? '') ?? 0,
      }))
      .filter((p) => p.colonies > 0);
    const coloniesPlaced = placements.reduce((sum, p) => sum + p.colonies, 0);
    counts(
      {
        ...(anyPlaced ? { placements, coloniesPlaced } : {}),
        ...leftBehindFields(),
        coloniesLost: numberOrNull(lost),
      },
      anyPlaced ? `${coloniesPlaced} colonies placed` : 'left behind and lost',
    );
    setSaidSaved('Placed counts kept.');
  };

  const saveWeights = () => {
    const stop = load.stops[weightStop];
    const values = weights
      .split(/[\s,;]+/)
      .map(Number)
      .filter((n) => Number.isFinite(n) && n > 0)
      .map((n) => Math.round(weightToKg(n, units) * 10) / 10);
    if (!stop || values.length === 0) return;
    onChange({
      kind: 'weights',
      moveId: move.id,
      payload: {
        yardId: stop.yardId,
        lotId: stop.lotId,
        sampledOn: move.nightOf,
        weightsKg: values,
      },
      label: `${load.truckName}: ${values.length} hive weights at ${stop.yardName}`,
    });
    setWeights('');
    setSaidSaved(`${values.length} weights kept.`);
  };

  const saveNote = () => {
    if (!note.trim()) return;
    onChange({
      kind: 'note',
      moveId: move.id,
      loadId: load.loadId,
      payload: { text: note.trim() },
      label: `${load.truckName}: a note`,
    });
    setNote('');
    setSaidSaved('Note kept.');
  };

  return (
    <article
      className="tn-surface flex flex-col gap-4 p-4"
      aria-label={load.truckName}
      data-load={load.loadId}
    >
      <header>
        <h3 className="text-xl font-semibold">{load.truckName}</h3>
        <p className="tn-muted">
          {load.driverNames.length ? load.driverNames.join(' & ') : 'No driver named'} ·{' '}
          {load.pallets} pallets, {load.colonies} colonies planned
        </p>
      </header>
      <div className="flex flex-col gap-2">
        <p className="font-semibold" data-testid="pallets-loaded">
          Pallets loaded: {loadedTotal} of {load.pallets}
        </p>
        {!byStop && recorded.palletsLoaded !== null && load.stops.length > 1 && (
          <p className="tn-muted text-sm">
            {recorded.palletsLoaded} were recorded for the whole truck; counting by yard below
            replaces that total.
          </p>
        )}
        <ol className="flex flex-col gap-3">
          {load.stops.map((stop, i) => (
            <li key={`${stop.yardId}-${stop.lotId}`} className="border-l-4 tn-line pl-3">
              <p className="font-semibold">
                {i + 1}. {stop.yardName} — {stop.pallets} pallets
              </p>
              <p className="tn-muted text-sm">{stop.lotName}</p>
              {stop.accessNotes && <p className="text-sm">{stop.accessNotes}</p>}
              <div className="mt-2">
                <Counter
                  label={`Pallets loaded at ${stop.yardName} on ${load.truckName}`}
                  value={loadedAt(stop)}
                  onChange={(value) => countAt(i, value)}
                />
              </div>
            </li>
          ))}
        </ol>
      </div>
      <details>
        <summary className="tn-button inline-flex items-center gap-2">
          Pre-roll check
          <span className={checkMissing.length ? 'tn-alert' : 'tn-muted'}>
            {recorded.preRollCheck
              ? checkMissing.length
                ? `· ${checkMissing.length} open`
                : `· done ${recorded.preRollCheck.checkedAt ? deviceClock(recorded.preRollCheck.checkedAt) : ''}`
              : '· not done'}
          </span>
        </summary>
        <fieldset className="mt-3 flex flex-col gap-2">
          <legend className="sr-only">Pre-roll check on {load.truckName}</legend>
          {preRollItems.map(({ item, label }) => (
            <label key={item} className="flex min-h-12 items-center gap-3">
              <input
                type="checkbox"
                className="size-7"
                checked={check[item]}
                onChange={(e) => setCheck({ ...check, [item]: e.target.checked })}
              />
              {label}
            </label>
          ))}
          <button type="button" className="tn-button tn-button-primary" onClick={saveCheck}>
            Keep the check
          </button>
        </fieldset>
      </details>
      <details>
        <summary className="tn-button inline-flex items-center">Placed, left behind, lost</summary>
        <div className="mt-3 flex flex-col gap-3">
          {move.destinations.map((d) => (
            <div key={d.id} className="grid grid-cols-2 gap-2">
              <CountInput
                label={`Placed at ${d.name}`}
                value={placed[d.id] ?? ''}
                onChange={(value) => setPlaced({ ...placed, [d.id]: value })}
              />
              <label className="flex flex-col gap-1">
                <span>Drop</span>
                <input
                  className="tn-input"
                  value={drops[d.id] ?? ''}
                  maxLength={40}
                  placeholder="e.g. 3"
                  onChange={(e) => setDrops({ ...drops, [d.id]: e.target.value })}
                />
              </label>
            </div>
          ))}
          {truckTotalOnly && (
            <p className="tn-muted text-sm">
              {recorded.coloniesLeftBehind} were recorded as left behind for the whole truck; giving
              them by yard below replaces that total.
            </p>
          )}
          <div className="grid grid-cols-2 gap-2">
            {load.stops.length === 0 ? (
              <CountInput label="Left behind" value={leftOnTruck} onChange={setLeftOnTruck} />
            ) : (
              load.stops.map((stop, i) => (
                <CountInput
                  key={`${stop.yardId}-${stop.lotId}`}
                  label={`Left behind at ${stopName(stop)}`}
                  value={leftBehind[i] ?? ''}
                  max={stop.colonies}
                  onChange={(value) =>
                    setLeftBehind(leftBehind.map((text, j) => (j === i ? value : text)))
                  }
                />
              ))
            )}
            <CountInput label="Lost on the road" value={lost} onChange={setLost} />
          </div>
          <button type="button" className="tn-button tn-button-primary" onClick={savePlacements}>
            Keep placed counts
          </button>
        </div>
      </details>
      <details>
        <summary className="tn-button inline-flex items-center">Hive weights and notes</summary>
        <div className="mt-3 flex flex-col gap-3">
          {load.stops.length > 1 && (
            <label className="flex flex-col gap-1">
              <span>Weighed at</span>
              <select
                className="tn-input"
                value={weightStop}
                onChange={(e) => setWeightStop(Number(e.target.value))}
              >
                {load.stops.map((s, i) => (
                  <option key={`${s.yardId}-${s.lotId}`} value={i}>
                    {s.yardName} ({s.lotName})
                  </option>
                ))}
              </select>
            </label>
          )}
          <label className="flex flex-col gap-1">
            <span>Weights ({weightUnit(units)}), separated by spaces</span>
            <input
              className="tn-input"
              inputMode="decimal"
              value={weights}
              placeholder={units === 'imperial' ? '128 121 135' : '58 55 61'}
              onChange={(e) => setWeights(e.target.value)}
            />
          </label>
          <button type="button" className="tn-button" onClick={saveWeights}>
            Keep weights
          </button>
          <label className="flex flex-col gap-1">
            <span>Note</span>
            <textarea
              className="tn-input py-2"
              rows={2}
              value={note}
              maxLength={2000}
              onChange={(e) => setNote(e.target.value)}
            />
          </label>
          <button type="button" className="tn-button" onClick={saveNote}>
            Keep note
          </button>
          {recorded.notes && (
            <p className="tn-muted whitespace-pre-line text-sm">{recorded.notes}</p>
          )}
        </div>
      </details>
      {saidSaved && (
        <p className="tn-muted text-sm" role="status">
          {saidSaved} It goes to the office with the next sync.
        </p>
      )}
      {load.departure && (
        <p className="tn-muted text-sm">
          {/* On each place's clock, as on the printed load sheet. */}
          Planned: rolls {formatLocalTime(load.departure, load.stops.at(-1)?.timeZone)}, arrives{' '}
          {formatLocalTime(load.arrival)}.
        </p>
      )}
    </article>
  );
}

import { recordedAtStop } from '@shared/domain/pick-up-stops';
import { preRollItems, preRollMissing } from '@shared/domain/pre-roll-check';
import { formatCount } from '@/lib/units';
import { nothingRecorded } from '@shared/schemas/moves';
import type { LoadSheetPage } from '../types';

const count = (value: number | null | undefined) =>
  value === null || value === undefined ? '—' : formatCount(value);

/** What the crew has recorded so far, per truck and pick-up yard, beside what was planned. */
export function CrewRecordsTable({ pages }: { pages: LoadSheetPage[] }) {
  if (pages.length === 0) return <p className="text-dusk-300">This move has no trucks.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[36rem] text-left text-sm" aria-label="Crew records">
        <thead className="text-dusk-300">
          <tr>
            <th className="py-2 pr-3 font-medium">Truck and pick-up</th>
            <th className="py-2 pr-3 text-right font-medium">Pallets planned</th>
            <th className="py-2 pr-3 text-right font-medium">Pallets loaded</th>
            <th className="py-2 pr-3 font-medium">Pre-roll check</th>
            <th className="py-2 pr-3 font-medium">Placed · left · lost</th>
          </tr>
        </thead>
        {pages.map((page) => {
          // A truck without a saved load yet (a plan computed now) has nothing recorded.
          const recorded = page.recorded ?? nothingRecorded;
          const byStop = recorded.palletsByStop;
          const missing = preRollMissing(recorded.preRollCheck);
          return (
            <tbody
              key={page.key}
              data-crew-truck={page.truckName}
              className="border-t border-dusk-700 align-top"
            >
              <tr>
                <th scope="row" className="py-2 pr-3 font-medium text-dusk-50">
                  {page.truckName}
                </th>
                <td className="py-2 pr-3 text-right">{formatCount(page.pallets)}</td>
                <td className="py-2 pr-3 text-right font-medium" data-testid="truck-loaded">
                  {count(recorded.palletsLoaded)}
                </td>
                <td className="py-2 pr-3">
                  {!recorded.preRollCheck ? (
                    <span className="text-dusk-300">Not kept</span>
                  ) : missing.length === 0 ? (
                    'All ticked'
                  ) : (
                    <span className="text-ember-300">
                      Open:{' '}
                      {preRollItems
                        .filter(({ item }) => missing.includes(item))
                        .map(({ label }) => label.toLowerCase())
                        .join('; ')}
                    </span>
                  )}
                </td>
                <td className="py-2 pr-3">
                  {count(recorded.coloniesPlaced)} · {count(recorded.coloniesLeftBehind)} ·{' '}
                  {count(recorded.coloniesLost)}
                </td>
              </tr>
              {page.stops.map((stop) => {
                const loaded = recordedAtStop(
                  byStop,
                  recorded.palletsLoaded,
                  page.stops,
                  stop,
                  (c) => c.pallets,
                );
                const left = recordedAtStop(
                  recorded.leftBehindByStop,
                  recorded.coloniesLeftBehind,
                  page.stops,
                  stop,
                  (c) => c.colonies,
                );
                return (
                  <tr key={`${stop.yardId}-${stop.lotId}`} data-crew-stop={stop.yardName}>
                    <td className="py-1 pr-3 pl-4 text-dusk-200">
                      {stop.yardName} <span className="text-dusk-300">({stop.lotName})</span>
                    </td>
                    <td className="py-1 pr-3 text-right text-dusk-200">
                      {formatCount(stop.pallets)}
                    </td>
                    <td className="py-1 pr-3 text-right text-dusk-200">
                      {count(byStop ? (loaded ?? 0) : loaded)}
                    </td>
                    <td />
                    <td className="py-1 pr-3 text-dusk-200" data-testid="stop-left-behind">
                      {left ? `${formatCount(left)} left in this yard` : ''}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          );
        })}
      </table>
    </div>
  );
}

import type { Units } from '@shared/schemas/users';
import { cx } from '@/components/ui/cx';
import { formatCount, formatWeight } from '@/lib/units';
import type { PlannedTruck, PlanTotals } from '../types';
import { formatLocalTime } from '@shared/domain/local-time';

/** Per truck: yards in pick-up order, pallets, colonies, weights, payload used and gross check. */
export function LoadSheetTable({
  trucks,
  totals,
  units,
  destinationZone,
}: {
  trucks: PlannedTruck[];
  totals: PlanTotals;
  units: Units;
  destinationZone?: string;
}) {
  if (trucks.length === 0) return <p className="text-dusk-300">Add a truck to see its load.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[44rem] text-left text-sm" aria-label="Load sheet">
        <thead className="text-dusk-300">
          <tr>
            <th className="py-2 pr-3 font-medium">Truck</th>
            <th className="py-2 pr-3 font-medium">Pick-ups</th>
            <th className="py-2 pr-3 text-right font-medium">Pallets</th>
            <th className="py-2 pr-3 text-right font-medium">Colonies</th>
            <th className="py-2 pr-3 text-right font-medium">Weight (mean / upper)</th>
            <th className="py-2 pr-3 text-right font-medium">Payload used</th>
            <th className="py-2 pr-3 font-medium">Gross</th>
          </tr>
        </thead>
        <tbody>
          {trucks.map((t) => (
            <tr
              key={t.key}
              data-truck-row={t.truckName}
              className="border-t border-dusk-700 align-top"
            >
              <td className="py-2 pr-3">
                <span className="font-medium text-dusk-50">{t.truckName}</span>
                <span className="block text-dusk-300">
                  {t.driverNames.length ? t.driverNames.join(' & ') : 'No driver named'}
                </span>
                {t.departure && (
                  <span className="block text-dusk-300">
                    Rolls {formatLocalTime(t.departure)} · in{' '}
                    {formatLocalTime(t.arrival, destinationZone)}
                  </span>
                )}
              </td>
              <td className="py-2 pr-3">
                {t.stops.length === 0 ? (
                  <span className="text-dusk-300">Empty</span>
                ) : (
                  <ol className="list-decimal pl-4">
                    {t.stops.map((s) => (
                      <li key={`${s.yardId}-${s.lotId}-${s.pickupOrder}`}>
                        {s.yardName} <span className="text-dusk-300">({s.lotName})</span>:{' '}
                        {formatCount(s.pallets)} pallets
                      </li>
                    ))}
                  </ol>
                )}
              </td>
              <td className="py-2 pr-3 text-right tabular-nums">
                {formatCount(t.pallets)} / {formatCount(t.palletSpots * t.tiers)}
              </td>
              <td className="py-2 pr-3 text-right tabular-nums">{formatCount(t.colonies)}</td>
              <td className="py-2 pr-3 text-right tabular-nums">
                {formatWeight(t.weightKg, units)}
                <span className="block text-dusk-300">
                  ≤ {formatWeight(t.weightUpperKg, units)}
                </span>
              </td>
              <td
                className={cx(
                  'py-2 pr-3 text-right tabular-nums',
                  t.payloadUsedUpperPercent > 100 && 'font-semibold text-rosehip-300',
                )}
              >
                {t.payloadUsedPercent.toFixed(0)} %
                <span className="block text-dusk-300">
                  ≤ {t.payloadUsedUpperPercent.toFixed(0)} %
                </span>
              </td>
              <td className="py-2 pr-3">
                {t.gross.withinLimit ? (
                  <span className="text-sage-300">Within legal gross</span>
                ) : (
                  <span className="font-semibold text-rosehip-300">Over legal gross</span>
                )}
                <span className="block text-dusk-300">
                  {formatWeight(t.gross.grossKg, units)} of{' '}
                  {formatWeight(t.gross.legalGrossKg, units)}
                </span>
              </td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr className="border-t border-dusk-500 font-medium">
            <td className="py-2 pr-3">{formatCount(totals.trucksUsed)} trucks used</td>
            <td className="py-2 pr-3">
              {totals.leftBehindColonies > 0 && (
                <span className="text-rosehip-300">
                  {formatCount(totals.leftBehindColonies)} colonies fit on no truck
                </span>
              )}
            </td>
            <td className="py-2 pr-3 text-right tabular-nums">{formatCount(totals.pallets)}</td>
            <td className="py-2 pr-3 text-right tabular-nums">
              {formatCount(totals.loadedColonies)}
            </td>
            <td className="py-2 pr-3 text-right tabular-nums">
              {formatWeight(totals.weightKg, units)}
              <span className="block text-dusk-300">
                ≤ {formatWeight(totals.weightUpperKg, units)}
              </span>
            </td>
            <td colSpan={2} />
          </tr>
        </tfoot>
      </table>
    </div>
  );
}

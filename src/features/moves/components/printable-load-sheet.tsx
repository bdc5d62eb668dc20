import type { Units } from '@shared/schemas/users';
import { preRollItems } from '@shared/domain/pre-roll-check';
import { formatCount, formatDate, formatWeight } from '@/lib/units';
import { formatLocalTime } from '@shared/domain/local-time';
import type { LoadSheet, LoadSheetPage } from '../types';
import './load-sheet-print.css';

function Destinations({ sheet }: { sheet: LoadSheet }) {
  return (
    <div>
      <h3 className="font-semibold">Destination</h3>
      <ul className="mt-1 flex flex-col gap-2">
        {sheet.destinations.map((d) => (
          <li key={d.id}>
            <span className="font-medium">{d.name}</span>
            {d.latitude !== null && d.longitude !== null && (
              <span className="text-dusk-300">
                {' '}
                ({d.latitude.toFixed(4)}, {d.longitude.toFixed(4)})
              </span>
            )}
            {d.dropMap && (
              <span className="block text-sm">
                Drop map: site {d.dropMap.siteId.slice(0, 8)}, {d.dropMap.drops} drops marked
                (Atlas)
              </span>
            )}
            {d.accessNotes && <span className="block text-sm">Access: {d.accessNotes}</span>}
            {d.grower && (
              <span className="block text-sm">
                {d.grower.name}:{' '}
                {d.grower.contacts
                  .filter((c) => c.phone)
                  .map((c) => `${c.name}${c.title ? ` (${c.title})` : ''} ${c.phone}`)
                  .join(' · ') || 'no phone on record'}
              </span>
            )}
          </li>
        ))}
      </ul>
    </div>
  );
}

function TruckPage({
  sheet,
  page,
  units,
}: {
  sheet: LoadSheet;
  page: LoadSheetPage;
  units: Units;
}) {
  const zone = sheet.timeline.window?.destination.timeZone;
  const pickupOf = (yardId: string) => page.pickups?.find((p) => p.yardId === yardId);
  return (
    <section
      className="load-sheet-page mb-8 flex flex-col gap-4 rounded-lg bg-dusk-850 p-5 ring-1 ring-dusk-700"
      aria-label={`Load sheet for ${page.truckName}`}
    >
      <header className="flex flex-wrap items-baseline justify-between gap-2 border-b border-dusk-600 pb-2">
        <h2 className="text-xl font-semibold">
          {page.truckName} · {sheet.move.name}
        </h2>
        <span>
          Night of {formatDate(sheet.move.nightOf)} · sheet {page.page} of {sheet.pages.length}
        </span>
      </header>
      <div className="grid gap-2 sm:grid-cols-2">
        <p>
          <span className="font-medium">Drivers:</span>{' '}
          {page.driverNames.length ? page.driverNames.join(' & ') : '________________'}
        </p>
        <p>
          <span className="font-medium">Rolls:</span> {formatLocalTime(page.departure)} ·{' '}
          <span className="font-medium">Arrives:</span> {formatLocalTime(page.arrival, zone)} ·{' '}
          <span className="font-medium">Dawn:</span> {formatLocalTime(page.civilDawn, zone)}
        </p>
        <p>
          <span className="font-medium">Load:</span> {formatCount(page.pallets)} pallets,{' '}
          {formatCount(page.colonies)} colonies, {formatWeight(page.weightKg, units)} expected (≤{' '}
          {formatWeight(page.weightUpperKg, units)})
        </p>
        <p>
          <span className="font-medium">Gross:</span> {formatWeight(page.gross.grossKg, units)} of{' '}
          {formatWeight(page.gross.legalGrossKg, units)} legal
          {page.gross.withinLimit ? '' : ' — OVER'} · payload{' '}
          {page.payloadUsedUpperPercent.toFixed(0)} %
        </p>
      </div>
      <table className="w-full text-left text-sm">
        <thead>
          <tr className="border-b border-dusk-600">
            <th className="py-1 pr-2">#</th>
            <th className="py-1 pr-2">Yard</th>
            <th className="py-1 pr-2">Lot</th>
            <th className="py-1 pr-2 text-right">Pallets</th>
            <th className="py-1 pr-2 text-right">Colonies</th>
            <th className="py-1 pr-2">Dusk · load from</th>
            <th className="py-1 pr-2">Access</th>
            <th className="py-1 pr-2">Loaded ✓</th>
            <th className="py-1">Left in yard</th>
          </tr>
        </thead>
        <tbody>
          {page.stops.map((s, i) => (
            <tr key={`${s.yardId}-${s.lotId}`} className="border-b border-dusk-700 align-top">
              <td className="py-1 pr-2">{i + 1}</td>
              <td className="py-1 pr-2 font-medium">{s.yardName}</td>
              <td className="py-1 pr-2">{s.lotName}</td>
              <td className="py-1 pr-2 text-right tabular-nums">{formatCount(s.pallets)}</td>
              <td className="py-1 pr-2 text-right tabular-nums">{formatCount(s.colonies)}</td>
              <td className="py-1 pr-2">
                {formatLocalTime(s.civilDusk, s.timeZone)}
                {pickupOf(s.yardId) && (
                  <span className="block">
                    load from {formatLocalTime(pickupOf(s.yardId)!.loadingStart, s.timeZone)}
                  </span>
                )}
              </td>
              <td className="py-1 pr-2">{s.accessNotes || '—'}</td>
              <td className="py-1 pr-2">______</td>
              <td className="py-1">______</td>
            </tr>
          ))}
        </tbody>
      </table>
      <Destinations sheet={sheet} />
      <div>
        <h3 className="font-semibold">Cautions</h3>
        <ul className="list-disc pl-5 text-sm">
          {sheet.cautions.map((c) => (
            <li key={c.code}>{c.message}</li>
          ))}
        </ul>
        <p className="mt-1 text-sm">State rules, permits and licensed practice come first.</p>
      </div>
      {sheet.warnings.filter((w) => !w.truckKey || w.truckKey === page.key).length > 0 && (
        <div>
          <h3 className="font-semibold">Planner's warnings</h3>
          <ul className="list-disc pl-5 text-sm">
            {sheet.warnings
              .filter((w) => !w.truckKey || w.truckKey === page.key)
              .map((w, i) => (
                <li key={`${w.code}-${i}`}>{w.message}</li>
              ))}
          </ul>
        </div>
      )}
      <p className="text-sm">
        Pre-roll check: {preRollItems.map(({ label }) => `☐ ${label.toLowerCase()}`).join('  ')}
      </p>
      <p className="text-sm">
        Pallets loaded per yard: {page.stops.map((s) => `${s.yardName} ______`).join(' · ')} ·
        Placed: ______ colonies · lost on the road ______
      </p>
    </section>
  );
}

/** One printed page per truck: pick-ups, weights, drivers, destination, contacts and cautions. */
export function PrintableLoadSheet({ sheet, units }: { sheet: LoadSheet; units: Units }) {
  return (
    <div className="load-sheet-print">
      {sheet.pages.length === 0 ? (
        <p>This move has no trucks yet.</p>
      ) : (
        sheet.pages.map((page) => (
          <TruckPage key={page.loadId} sheet={sheet} page={page} units={units} />
        ))
      )}
    </div>
  );
}

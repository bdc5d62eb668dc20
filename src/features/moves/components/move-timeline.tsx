import type { PlanTimeline } from '../types';
import { formatDuration, formatLocalTime } from '@shared/domain/local-time';

interface Row {
  label: string;
  time: string;
  detail?: string;
}

/**
 * Dusk at each yard, loading (and the drives between pick-up yards), departure, the legs, arrival
 * and dawn, each on its own place's clock.
 */
export function MoveTimeline({ timeline }: { timeline: PlanTimeline }) {
  const w = timeline.window;
  if (!w) return <p className="text-dusk-300">Choose a yard and a destination to see the night.</p>;
  const rows: Row[] = [
    ...timeline.originDusk.map((d) => ({
      label: `Dusk at ${d.yardName}`,
      time: formatLocalTime(d.civilDusk ?? d.sunset, d.timeZone),
      detail: d.sunset ? `sunset ${formatLocalTime(d.sunset, d.timeZone)}` : undefined,
    })),
    ...(timeline.pickups?.length
      ? timeline.pickups.flatMap((p, i): Row[] =>
          i === 0
            ? [
                {
                  label: `Loading starts at ${p.yardName}`,
                  time: formatLocalTime(p.loadingStart, p.timeZone),
                },
              ]
            : [
                {
                  label: `Drive to ${p.yardName}`,
                  time: formatDuration(p.driveMinutes),
                  detail: `${Math.round(p.driveKm)} km`,
                },
                {
                  label: `Loading at ${p.yardName}`,
                  time: formatLocalTime(p.loadingStart, p.timeZone),
                },
              ],
        )
      : [
          {
            label: `Loading starts at ${timeline.from?.yardName ?? 'the first yard'}`,
            time: formatLocalTime(w.loadingStart, w.origin.timeZone),
          },
        ]),
    { label: 'Departure', time: formatLocalTime(w.departure, w.origin.timeZone) },
    ...w.legs.map((leg, i) => ({
      label:
        leg.kind === 'drive'
          ? `Drive ${i + 1}${leg.driver ? ` (driver ${leg.driver})` : ''}`
          : `Rest ${i + 1}`,
      time: `${formatLocalTime(leg.start)} → ${formatLocalTime(leg.end)}`,
      detail: `${formatDuration(leg.minutes)}${leg.distanceKm ? `, ${Math.round(leg.distanceKm)} km` : ''}`,
    })),
    {
      label: `Arrival at ${timeline.to?.name ?? 'the destination'}`,
      time: formatLocalTime(w.arrival, w.destination.timeZone),
      detail: `${Math.round(w.distanceKm)} km, ${formatDuration(w.driveMinutes)} driving${w.restMinutes ? `, ${formatDuration(w.restMinutes)} rest` : ''}`,
    },
    {
      label: 'Dawn at the destination',
      time: formatLocalTime(w.destination.civilDawn, w.destination.timeZone),
      detail: w.arrivesBeforeDawn === false ? 'arrives after this dawn' : undefined,
    },
  ];
  return (
    <div>
      <ol className="flex flex-col" aria-label="Timeline">
        {rows.map((row, i) => (
          <li
            key={`${row.label}-${i}`}
            className="grid grid-cols-1 gap-x-4 border-l-2 border-ember-600 py-1.5 pl-3 sm:grid-cols-[14rem_1fr]"
          >
            <span className="text-dusk-300">{row.label}</span>
            <span className="tabular-nums text-dusk-50" data-timeline-label={row.label}>
              {row.time}
              {row.detail && <span className="ml-2 text-sm text-dusk-300">{row.detail}</span>}
            </span>
          </li>
        ))}
      </ol>
      {w.latestDepartureForDawn && (
        <p className="mt-2 text-sm text-dusk-300">
          Latest departure that still arrives before dawn:{' '}
          {formatLocalTime(w.latestDepartureForDawn, w.origin.timeZone)}
        </p>
      )}
      {w.notes.length > 0 && (
        <ul className="mt-2 list-disc pl-5 text-sm text-dusk-300">
          {w.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      )}
    </div>
  );
}

import { Link } from 'react-router-dom';
import { EmptyState } from '@/components/ui/empty-state';
import { formatCount, formatDate } from '@/lib/units';
import type { Move } from '../types';
import { MoveStatusBadge } from './move-status';

/** Moves grouped by night, soonest first, each with its status and size. */
export function MovesList({
  moves,
  placeNames,
  linkTo,
}: {
  moves: Move[];
  placeNames: Record<string, string>;
  linkTo: (id: string) => string;
}) {
  if (moves.length === 0)
    return <EmptyState title="No moves in this period">Plan one to see it here.</EmptyState>;
  const nights = new Map<string, Move[]>();
  for (const move of [...moves].sort((a, b) => a.nightOf.localeCompare(b.nightOf))) {
    nights.set(move.nightOf, [...(nights.get(move.nightOf) ?? []), move]);
  }
  return (
    <div className="flex flex-col gap-5">
      {[...nights.entries()].map(([night, list]) => (
        <section key={night} aria-label={`Night of ${formatDate(night)}`}>
          <h2 className="mb-2 text-sm font-semibold tracking-wide text-dusk-300 uppercase">
            Night of {formatDate(night)}
          </h2>
          <ul className="flex flex-col gap-2">
            {list.map((move) => {
              const colonies = move.origins.reduce((sum, o) => sum + o.colonies, 0);
              return (
                <li
                  key={move.id}
                  className="flex flex-wrap items-center gap-3 rounded-lg bg-dusk-850 px-4 py-3 ring-1 ring-dusk-700"
                >
                  <Link to={linkTo(move.id)} className="font-medium">
                    {move.name}
                  </Link>
                  <MoveStatusBadge status={move.status} />
                  <span className="text-sm text-dusk-300">
                    {formatCount(colonies)} colonies · {move.loads.length} truck
                    {move.loads.length === 1 ? '' : 's'} ·{' '}
                    {move.destinationIds.map((id) => placeNames[id] ?? 'a place').join(', ')}
                  </span>
                </li>
              );
            })}
          </ul>
        </section>
      ))}
    </div>
  );
}

import { Link } from 'react-router-dom';
import type { SeasonBoard } from '../types';

const CELL = 'w-9 min-w-9';

/** Weeks across; contracts (delivery to removal) and moves (their night) down. */
export function SeasonGrid({
  board,
  contractLink,
  moveLink,
}: {
  board: SeasonBoard;
  contractLink: (id: string) => string;
  moveLink: (id: string) => string;
}) {
  return (
    <div className="overflow-x-auto">
      <table className="border-separate border-spacing-0 text-sm" aria-label="Season board">
        <thead>
          <tr>
            <th className="sticky left-0 z-10 min-w-56 bg-dusk-900 py-2 pr-3 text-left font-medium text-dusk-300">
              Contract or move
            </th>
            {board.weeks.map((w) => (
              <th
                key={w.week}
                className={`${CELL} py-2 text-center font-normal text-dusk-300`}
                title={`${w.weekStart} to ${w.weekEnd}`}
              >
                {w.week.slice(6)}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {board.contracts.map((c) => (
            <tr key={c.id}>
              <th
                scope="row"
                className="sticky left-0 z-10 bg-dusk-900 py-1 pr-3 text-left font-normal"
              >
                <Link to={contractLink(c.id)}>
                  {c.growerName}: {c.crop}
                </Link>
                <span className="block text-xs text-dusk-300">
                  {c.coloniesOrdered} colonies · {c.status}
                </span>
              </th>
              {board.weeks.map((w) => {
                const delivery = c.deliveryWeeks.includes(w.week);
                const placed = c.weeks.includes(w.week);
                return (
                  <td key={w.week} className={`${CELL} px-0 py-1`}>
                    {placed && (
                      <span
                        className={`block h-4 ${delivery ? 'bg-ember-400' : 'bg-ember-600/50'}`}
                        title={
                          delivery
                            ? 'Delivery'
                            : c.removalAssumed
                              ? 'In bloom (removal assumed)'
                              : 'In bloom'
                        }
                      />
                    )}
                  </td>
                );
              })}
            </tr>
          ))}
          {board.moves.map((m) => (
            <tr key={m.id}>
              <th
                scope="row"
                className="sticky left-0 z-10 bg-dusk-900 py-1 pr-3 text-left font-normal"
              >
                <Link to={moveLink(m.id)}>{m.name}</Link>
                <span className="block text-xs text-dusk-300">
                  {m.nightOf} · {m.colonies} colonies · {m.status}
                </span>
              </th>
              {board.weeks.map((w) => (
                <td key={w.week} className={`${CELL} px-0 py-1 text-center`}>
                  {m.week === w.week && (
                    <Link
                      to={moveLink(m.id)}
                      aria-label={`${m.name}, night of ${m.nightOf}`}
                      className="inline-block size-4 rounded-full bg-sage-400"
                    />
                  )}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {board.contracts.length + board.moves.length === 0 && (
        <p className="mt-3 text-dusk-300">No contracts or moves in this period.</p>
      )}
    </div>
  );
}

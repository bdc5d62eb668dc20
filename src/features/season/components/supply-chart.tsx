import type { SeasonBoard } from '../types';

const W = 28; // px per week
const H = 180;
const PAD = { top: 12, right: 12, bottom: 28, left: 52 };

/**
 * Colonies needed (bars) against colonies available (line) by week, and the colonies strong
 * enough for each contract's minimum (dashed line); our own SVG, no chart library.
 */
export function SupplyChart({ board }: { board: SeasonBoard }) {
  const rows = board.balance;
  if (rows.length === 0) return null;
  const strongEnough = rows.map((r) =>
    r.byStrength.length ? Math.min(...r.byStrength.map((s) => s.available)) : null,
  );
  const max = Math.max(1, ...rows.map((r) => Math.max(r.coloniesNeeded, r.coloniesAvailable)));
  const width = PAD.left + PAD.right + rows.length * W;
  const y = (v: number) => PAD.top + (H - PAD.top - PAD.bottom) * (1 - v / max);
  const x = (i: number) => PAD.left + i * W + W / 2;
  const line = (values: Array<number | null>) =>
    values
      .map((v, i) => (v === null ? null : `${x(i)},${y(v)}`))
      .filter(Boolean)
      .join(' ');
  const ticks = [0, max / 2, max].map((v) => Math.round(v));
  return (
    <figure className="overflow-x-auto">
      <svg
        width={width}
        height={H}
        viewBox={`0 0 ${width} ${H}`}
        role="img"
        aria-label="Colonies needed and available by week"
      >
        {ticks.map((t) => (
          <g key={t}>
            <line x1={PAD.left} x2={width - PAD.right} y1={y(t)} y2={y(t)} stroke="#2c3a4e" />
            <text x={PAD.left - 6} y={y(t) + 4} textAnchor="end" fontSize="11" fill="#a9b5c6">
              {t}
            </text>
          </g>
        ))}
        {rows.map((r, i) => (
          <g key={r.week}>
            <rect
              x={x(i) - W * 0.35}
              width={W * 0.7}
              y={y(r.coloniesNeeded)}
              height={Math.max(0, y(0) - y(r.coloniesNeeded))}
              fill={r.covered ? '#8f6a2a' : '#b5524a'}
            >
              <title>
                {r.week}: {r.coloniesNeeded} needed, {r.coloniesAvailable} available
                {r.shortfall ? `, ${r.shortfall} short` : ''}
              </title>
            </rect>
            {i % 2 === 0 && (
              <text x={x(i)} y={H - 10} textAnchor="middle" fontSize="10" fill="#a9b5c6">
                {r.week.slice(5)}
              </text>
            )}
          </g>
        ))}
        <polyline
          points={line(rows.map((r) => r.coloniesAvailable))}
          fill="none"
          stroke="#8fd3a8"
          strokeWidth="2"
        />
        <polyline
          points={line(strongEnough)}
          fill="none"
          stroke="#f6c77a"
          strokeWidth="2"
          strokeDasharray="5 4"
        />
      </svg>
      <figcaption className="mt-2 flex flex-wrap gap-4 text-sm text-dusk-300">
        <span>
          <span className="mr-1 inline-block h-3 w-3 bg-[#8f6a2a] align-middle" /> needed (red when
          short)
        </span>
        <span>
          <span className="mr-1 inline-block h-0.5 w-4 bg-sage-400 align-middle" /> available
        </span>
        <span>
          <span className="mr-1 inline-block h-0.5 w-4 bg-ember-300 align-middle" /> available at
          the contracts' minimum strength
        </span>
      </figcaption>
    </figure>
  );
}

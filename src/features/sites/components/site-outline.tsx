import type { FeatureCollection, Point, Polygon } from 'geojson';

const SIZE = 240;
const PAD = 12;

/**
 * The block's boundary drawn as an outline (north up), with drops as dots. Longitudes are
 * scaled by cos(latitude) so the shape keeps its proportions at these small extents.
 */
export function SiteOutline({
  boundary,
  drops,
  label,
}: {
  boundary: Polygon;
  drops?: FeatureCollection<Point> | null;
  label: string;
}) {
  const outer = boundary.coordinates[0] ?? [];
  if (outer.length < 3) return null;
  const midLat = outer.reduce((sum, p) => sum + p[1], 0) / outer.length;
  const k = Math.cos((midLat * Math.PI) / 180);
  const xs = outer.map((p) => p[0] * k);
  const ys = outer.map((p) => p[1]);
  const minX = Math.min(...xs);
  const maxY = Math.max(...ys);
  const span = Math.max(Math.max(...xs) - minX, maxY - Math.min(...ys)) || 1;
  const scale = (SIZE - 2 * PAD) / span;
  const project = ([lon, lat]: number[]) =>
    [PAD + (lon * k - minX) * scale, PAD + (maxY - lat) * scale] as const;
  const ring = (coords: number[][]) =>
    coords
      .map((p) =>
        project(p)
          .map((n) => n.toFixed(1))
          .join(','),
      )
      .join(' ');
  const dropPoints = drops?.features ?? [];

  return (
    <svg
      viewBox={`0 0 ${SIZE} ${SIZE}`}
      role="img"
      aria-label={label}
      className="h-60 w-60 max-w-full rounded-lg bg-dusk-950 ring-1 ring-dusk-700"
    >
      {boundary.coordinates.map((coords, i) => (
        <polygon
          key={i}
          points={ring(coords)}
          fill={i === 0 ? '#f2b451' : '#0d131c'}
          fillOpacity={i === 0 ? 0.15 : 1}
          stroke="#f6c77a"
          strokeWidth={2}
          strokeLinejoin="round"
        />
      ))}
      {dropPoints.map((drop, i) => {
        const [x, y] = project(drop.geometry.coordinates);
        return <circle key={i} cx={x} cy={y} r={4} fill="#8fd3a8" />;
      })}
      <text x={SIZE - PAD} y={PAD + 4} textAnchor="end" fontSize="11" fill="#a9b5c6">
        N ↑
      </text>
    </svg>
  );
}

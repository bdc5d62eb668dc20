import type { Polygon } from 'geojson';

export interface OrchardShape {
  id: string;
  name: string;
  boundary: Polygon | null;
  latitude: number | null;
  longitude: number | null;
}

const width = 600;
const height = 360;
const margin = 28;

/**
 * The grower's blocks drawn as outlines on a plain background: an equirectangular projection
 * scaled by the cosine of the mean latitude, which is true enough over a few kilometres. No map
 * tiles, so nothing is fetched from another host.
 */
export function OrchardOutlines({ shapes }: { shapes: OrchardShape[] }) {
  const rings = shapes.map((shape) => ({
    shape,
    ring:
      shape.boundary?.coordinates[0] ??
      (shape.longitude !== null && shape.latitude !== null
        ? [[shape.longitude, shape.latitude]]
        : []),
  }));
  const points = rings.flatMap((r) => r.ring);
  if (points.length === 0)
    return <p className="text-dusk-300">No block outlines have been drawn yet.</p>;

  const lats = points.map((p) => p[1]);
  const lons = points.map((p) => p[0]);
  const cosLat = Math.cos((((Math.min(...lats) + Math.max(...lats)) / 2) * Math.PI) / 180);
  const minX = Math.min(...lons) * cosLat;
  const maxX = Math.max(...lons) * cosLat;
  const minY = Math.min(...lats);
  const maxY = Math.max(...lats);
  const scale = Math.min(
    (width - 2 * margin) / Math.max(maxX - minX, 1e-6),
    (height - 2 * margin) / Math.max(maxY - minY, 1e-6),
  );
  const offsetX = (width - (maxX - minX) * scale) / 2;
  const offsetY = (height - (maxY - minY) * scale) / 2;
  const project = ([lon, lat]: number[]) =>
    [offsetX + (lon * cosLat - minX) * scale, offsetY + (maxY - lat) * scale] as const;

  return (
    <svg
      viewBox={`0 0 ${width} ${height}`}
      role="img"
      aria-label={`Outlines of ${shapes.map((s) => s.name).join(', ')}`}
      className="h-auto w-full rounded-md bg-dusk-950 ring-1 ring-dusk-700"
    >
      {rings.map(({ shape, ring }) => {
        if (ring.length === 0) return null;
        const projected = ring.map(project);
        const cx = projected.reduce((s, p) => s + p[0], 0) / projected.length;
        const cy = projected.reduce((s, p) => s + p[1], 0) / projected.length;
        return (
          <g key={shape.id}>
            {projected.length > 1 ? (
              <polygon
                points={projected.map((p) => p.join(',')).join(' ')}
                className="fill-ember-400/20 stroke-ember-300"
                strokeWidth={2}
              />
            ) : (
              <circle cx={cx} cy={cy} r={6} className="fill-ember-300" />
            )}
            <text
              x={cx}
              y={projected.length > 1 ? cy : cy - 10}
              textAnchor="middle"
              className="fill-dusk-50 text-[13px] font-medium"
            >
              {shape.name}
            </text>
          </g>
        );
      })}
    </svg>
  );
}

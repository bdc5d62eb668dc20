/**
 * Calculation benchmark (a plain script, not a timed test): node --import tsx bench/calc.bench.ts
 *
 * Times the domain computations on planning-sized inputs and, in the same run, the raw library
 * calls underneath them, so the overhead of our code prints as a ratio.
 */
import {
  area,
  booleanPointInPolygon,
  point,
  pointGrid,
  pointsWithinPolygon,
  polygon,
} from '@turf/turf';
import { find } from 'geo-tz';
import type { Polygon } from 'geojson';
import { getTimes } from 'suncalc';
import { planNightLoads, type TruckCapacity, type YardSupply } from '../shared/domain/load-plan';
import { computeMoveWindow, type MoveWindowInput } from '../shared/domain/move-window';
import { computeSitePlan } from '../shared/domain/site-plan';
import { addDays } from '../shared/domain/calendar-date';

/** Small deterministic generator (mulberry32) so every run times the same inputs. */
function random(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

function time<T>(label: string, run: () => T): { ms: number; result: T } {
  const start = performance.now();
  const result = run();
  const ms = performance.now() - start;
  console.log(`${label.padEnd(58)} ${ms.toFixed(1).padStart(9)} ms`);
  return { ms, result };
}

function ratio(label: string, ours: number, raw: number): void {
  console.log(`${label.padEnd(58)} ${(ours / raw).toFixed(1).padStart(9)} ×`);
}

const rand = random(2026);

// Warm-up: geo-tz loads its data lazily, turf and suncalc get compiled.
find(37, -120);
getTimes(new Date(), 37, -120);

// 1. A night of 20,000 colonies from 12 yards onto 40 trucks.
const yards: YardSupply[] = Array.from({ length: 12 }, (_, i) => ({
  yardId: `yard-${i + 1}`,
  colonies: i < 11 ? 1_667 : 20_000 - 11 * 1_667,
  hiveWeightKg: {
    mean: 40 + rand() * 15,
    sd: 3 + rand() * 3,
    samples: 10 + Math.floor(rand() * 30),
  },
}));
const trucks: TruckCapacity[] = Array.from({ length: 40 }, (_, i) => ({
  id: `truck-${i + 1}`,
  payloadKg: 20_000 + rand() * 2_500,
  palletSpots: 26,
  tiers: 4,
}));
const loads = time('load plan: 20,000 colonies, 12 yards, 40 trucks', () =>
  planNightLoads({ yards, trucks, coloniesPerPallet: 4, palletTareKg: 20 }),
);
console.log(
  `  → ${loads.result.trucksUsed} trucks used, ${loads.result.unassignedColonies} colonies left behind`,
);

// 2. 1,000 move timelines between random farm points in the lower 48 states.
const moves: MoveWindowInput[] = Array.from({ length: 1_000 }, () => ({
  origin: { lat: 27 + rand() * 21, lon: -122 + rand() * 40 },
  destination: { lat: 27 + rand() * 21, lon: -122 + rand() * 40 },
  date: addDays('2026-01-01', Math.floor(rand() * 365)),
  loadingMinutes: 60 + Math.floor(rand() * 120),
  averageSpeedKmh: 70 + rand() * 20,
  drivers: rand() < 0.5 ? 1 : 2,
}));
let legs = 0;
const timelines = time('move timelines: 1,000', () => {
  for (const move of moves) legs += computeMoveWindow(move).legs.length;
});
// Underneath: each timeline makes about 3–4 suncalc solves and 2 + legs geo-tz lookups.
const sunCalls = 4 * moves.length;
const rawSun = time(`  raw suncalc getTimes × ${sunCalls}`, () => {
  for (let i = 0; i < sunCalls; i++) {
    const m = moves[i % moves.length];
    getTimes(new Date(Date.UTC(2026, 0, 1 + (i % 365), 20)), m.origin.lat, m.origin.lon);
  }
});
const tzCalls = 2 * moves.length + legs;
const rawTz = time(`  raw geo-tz find × ${tzCalls}`, () => {
  for (let i = 0; i < tzCalls; i++) {
    const m = moves[i % moves.length];
    find(i % 2 ? m.origin.lat : m.destination.lat, i % 2 ? m.origin.lon : m.destination.lon);
  }
});
ratio('  timelines ÷ (raw suncalc + raw geo-tz)', timelines.ms, rawSun.ms + rawTz.ms);

// 3. Drops for a 2,000-acre U-shaped (concave) almond block: 7 cells of about 1.16 km².
const lat0 = 37.5;
const lon0 = -120.8;
const dLat = 0.00972;
const dLon = 0.01221;
const cells: [number, number][] = [
  [0, 0],
  [3, 0],
  [3, 3],
  [2, 3],
  [2, 1],
  [1, 1],
  [1, 3],
  [0, 3],
  [0, 0],
];
const uBlock: Polygon = {
  type: 'Polygon',
  coordinates: [cells.map(([x, y]) => [lon0 + x * dLon, lat0 + y * dLat])],
};
const site = time('site plan: 2,000-acre U block, almonds, 6 pallets a drop', () =>
  computeSitePlan({ crop: 'almond', boundary: uBlock, coloniesPerPallet: 4, palletsPerDrop: 6 }),
);
console.log(
  `  → ${site.result.areaAcres.toFixed(0)} acres, ${site.result.colonies} colonies, ${site.result.drops.features.length} drops`,
);
const feature = polygon(uBlock.coordinates);
const rawArea = time('  raw turf area × 1', () => area(feature));
const candidateCount = Math.min(20_000, Math.max(400, site.result.drops.features.length * 12));
const grid = pointGrid(
  [lon0, lat0, lon0 + 3 * dLon, lat0 + 3 * dLat],
  Math.sqrt((area(feature) * 9) / 7 / candidateCount) / 1000,
  { units: 'kilometers' },
);
const rawWithin = time(`  raw turf pointsWithinPolygon (${grid.features.length} points)`, () =>
  pointsWithinPolygon(grid, feature),
);
const rawPip = time(`  raw turf booleanPointInPolygon × ${grid.features.length}`, () => {
  for (const p of grid.features)
    booleanPointInPolygon(point(p.geometry.coordinates), feature, { ignoreBoundary: true });
});
ratio('  site plan ÷ (raw area + raw pointsWithinPolygon)', site.ms, rawArea.ms + rawWithin.ms);
ratio('  site plan ÷ raw booleanPointInPolygon grid', site.ms, rawPip.ms);

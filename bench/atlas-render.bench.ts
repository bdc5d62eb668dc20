/**
 * Atlas render benchmark (issue 6; a plain script, not a test):
 *   DATABASE_URL=postgres://…/any node --import tsx bench/atlas-render.bench.ts
 *
 * The demo operation plus 2,000 yards (Texas and California), 500 site boundaries (small squares
 * in the Central Valley) and 300 planned moves inside the Atlas's date window. Measured in headless
 * Chromium, from navigation start to the last of: the Atlas API answer received, the map's overlay
 * canvas painted, and the network idle (no request for 500 ms; the end is the last request's
 * finish). The same in the same run for a bare Leaflet page (`preferCanvas: true`, no tiles, no
 * React) drawing the very same GeoJSON, fetched once from our API; the figure is ours ÷ bare.
 * Both are warm (the first visit of each is a discarded warm-up): a returning planner.
 */
import { readFileSync } from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import type { Page } from 'playwright-core';
import {
  addDaysIso,
  demoOperationId,
  report,
  startBench,
  stats,
  todayIso,
} from './support/browser-bench';

const YARDS = 2000;
const SITES = 500;
const MOVES = 300;
const RUNS = Number(process.env.BENCH_RUNS ?? 5);
const leafletDist = path.resolve(import.meta.dirname, '../node_modules/leaflet/dist');

/** A fixed pseudo-random number in [0, 1) for i and a salt (the same data every run). */
const rand = (i: number, salt: number) => {
  const x = Math.sin(i * 12.9898 + salt * 78.233) * 43758.5453;
  return x - Math.floor(x);
};

const barePage = `<!doctype html>
<html><head><meta charset="utf-8"><title>Bare Leaflet</title>
<link rel="stylesheet" href="/leaflet/leaflet.css">
<style>html,body,#map{height:100%;margin:0}</style></head>
<body><div id="map"></div>
<script src="/leaflet/leaflet.js"></script>
<script>
const map = L.map('map', { preferCanvas: true, center: [37.5, -98], zoom: 4 });
fetch('/atlas.json').then((r) => r.json()).then((atlas) => {
  const point = (colour, radius) => ({ pointToLayer: (f, ll) => L.circleMarker(ll, { radius, color: colour, weight: 1, fillOpacity: 0.6 }) });
  const layers = [
    L.geoJSON(atlas.sites, { style: { color: '#6a8', weight: 1, fillOpacity: 0.3 }, ...point('#6a8', 6) }),
    L.geoJSON(atlas.moves, { style: { color: '#e93', weight: 2, dashArray: '6 4' } }),
    L.geoJSON(atlas.drops, point('#fd6', 3.5)),
    L.geoJSON(atlas.yards, point('#fb4', 5)),
  ];
  const group = L.featureGroup(layers).addTo(map);
  map.fitBounds(group.getBounds().pad(0.15), { maxZoom: 11 });
});
</script></body></html>`;

/** Navigates and returns ms from navigation start to API answer + canvas painted + network idle. */
async function timeRender(page: Page, url: string, apiPath: string) {
  let lastFinished = 0;
  let apiAt = 0;
  const t0 = performance.now();
  const finished = (request: { url(): string }) => {
    lastFinished = performance.now();
    if (new URL(request.url()).pathname === apiPath) apiAt = lastFinished;
  };
  page.on('requestfinished', finished);
  page.on('requestfailed', finished);
  await page.goto(url, { waitUntil: 'commit' });
  await page.waitForFunction(
    () => {
      const canvas = document.querySelector('.leaflet-overlay-pane canvas') as HTMLCanvasElement;
      if (!canvas || canvas.width === 0) return false;
      const data = canvas.getContext('2d')!.getImageData(0, 0, canvas.width, canvas.height).data;
      for (let i = 3; i < data.length; i += 64) if (data[i] > 0) return true;
      return false;
    },
    undefined,
    { polling: 50, timeout: 60_000 },
  );
  const paintedAt = performance.now();
  await page.waitForLoadState('networkidle', { timeout: 60_000 });
  page.off('requestfinished', finished);
  page.off('requestfailed', finished);
  if (!apiAt) throw new Error(`${apiPath} was never received`);
  return {
    total: Math.max(paintedAt, apiAt, lastFinished) - t0,
    api: apiAt - t0,
    painted: paintedAt - t0,
  };
}
type Timing = Awaited<ReturnType<typeof timeRender>>;

const bench = await startBench();
let bare: http.Server | undefined;
try {
  const started = performance.now();
  const operationId = await demoOperationId(bench);
  const today = todayIso();
  const [lot] = await bench.db.query(
    `SELECT id FROM colony_lots WHERE operation_id = $1 AND archived_at IS NULL ORDER BY name LIMIT 1`,
    [operationId],
  );
  const growers = (
    await bench.db.query(`SELECT id FROM growers WHERE operation_id = $1 ORDER BY name`, [
      operationId,
    ])
  ).map((g: { id: string }) => g.id);

  const yards = Array.from({ length: YARDS }, (_, i) => {
    const texas = i % 2 === 0;
    return {
      name: `Atlas bench yard ${String(i + 1).padStart(4, '0')}`,
      latitude: texas ? 26.5 + rand(i, 1) * 8.5 : 33 + rand(i, 1) * 7.5,
      longitude: texas ? -104 + rand(i, 2) * 10 : -122.5 + rand(i, 2) * 5.5,
      colonies: 24 + Math.floor(rand(i, 3) * 400),
    };
  });
  const yardIds = (
    await bench.db.query(
      `INSERT INTO yards (operation_id, name, latitude, longitude, capacity)
       SELECT $1, r.name, r.latitude, r.longitude, 500
         FROM jsonb_to_recordset($2::jsonb) AS r(name text, latitude float8, longitude float8)
       RETURNING id`,
      [operationId, JSON.stringify(yards)],
    )
  ).map((y: { id: string }) => y.id);
  await bench.db.query(
    `INSERT INTO ledger_entries (operation_id, lot_id, kind, occurred_on, colonies, to_kind, to_id, reason)
     SELECT $1, $2, 'purchase', '2026-10-01', r.colonies, 'yard', r.id, 'bench'
       FROM jsonb_to_recordset($3::jsonb) AS r(id uuid, colonies int)`,
    [
      operationId,
      lot.id,
      JSON.stringify(yardIds.map((id: string, i: number) => ({ id, colonies: yards[i].colonies }))),
    ],
  );

  const sites = Array.from({ length: SITES }, (_, i) => {
    const lat = 35 + rand(i, 4) * 4.5;
    const lon = -121.5 + rand(i, 5) * 2.5;
    const d = 0.004 + rand(i, 6) * 0.01; // about 0.4–1.5 km a side
    return {
      growerId: i % 3 === 0 || growers.length === 0 ? null : growers[i % growers.length],
      name: `Atlas bench block ${String(i + 1).padStart(3, '0')}`,
      latitude: lat + d / 2,
      longitude: lon + d / 2,
      areaHa: Math.round(d * 111 * d * 88 * 100),
      boundary: {
        type: 'Polygon',
        coordinates: [
          [
            [lon, lat],
            [lon + d, lat],
            [lon + d, lat + d],
            [lon, lat + d],
            [lon, lat],
          ],
        ],
      },
    };
  });
  const siteIds = (
    await bench.db.query(
      `INSERT INTO sites (operation_id, grower_id, name, kind, crop, boundary, latitude, longitude, area_ha)
       SELECT $1, r."growerId", r.name, 'orchard', 'almond', r.boundary, r.latitude, r.longitude, r."areaHa"
         FROM jsonb_to_recordset($2::jsonb)
           AS r("growerId" uuid, name text, boundary jsonb, latitude float8, longitude float8, "areaHa" float8)
       RETURNING id`,
      [operationId, JSON.stringify(sites)],
    )
  ).map((s: { id: string }) => s.id);

  // Inside the Atlas's window on today: from a week back to a month ahead.
  const moves = Array.from({ length: MOVES }, (_, i) => ({
    name: `Atlas bench move ${String(i + 1).padStart(3, '0')}`,
    nightOf: addDaysIso(today, -6 + (i % 35)),
    destinationIds: [siteIds[i % siteIds.length]],
  }));
  const moveIds = (
    await bench.db.query(
      `INSERT INTO moves (operation_id, name, night_of, status, destination_kind, destination_ids)
       SELECT $1, r.name, r."nightOf", 'planned', 'site', ARRAY(SELECT jsonb_array_elements_text(r."destinationIds")::uuid)
         FROM jsonb_to_recordset($2::jsonb) AS r(name text, "nightOf" date, "destinationIds" jsonb)
       RETURNING id`,
      [operationId, JSON.stringify(moves)],
    )
  ).map((m: { id: string }) => m.id);
  // One or two origin yards per move (a MultiLineString for two).
  const origins = moveIds.flatMap((moveId: string, i: number) =>
    Array.from({ length: 1 + (i % 2) }, (_, k) => ({
      moveId,
      yardId: yardIds[(i * 7 + k * 13) % yardIds.length],
      colonies: 10,
      pickupOrder: k,
    })),
  );
  await bench.db.query(
    `INSERT INTO move_origins (operation_id, move_id, yard_id, lot_id, colonies, pickup_order)
     SELECT $1, r."moveId", r."yardId", $2, r.colonies, r."pickupOrder"
       FROM jsonb_to_recordset($3::jsonb) AS r("moveId" uuid, "yardId" uuid, colonies int, "pickupOrder" int)`,
    [operationId, lot.id, JSON.stringify(origins)],
  );

  const { signIn } = await import('../tests/e2e/support/e2e-app');
  const page = await bench.newPage();
  await signIn(page, bench.origin, 'planner@demo.test');
  const answer = await page.request.get(`${bench.origin}/api/atlas?on=${today}`);
  if (answer.status() !== 200) throw new Error(`/api/atlas answered ${answer.status()}`);
  const atlasJson = await answer.text();
  const atlas = JSON.parse(atlasJson) as Record<string, { features: unknown[] }>;
  const count = (k: string) => atlas[k].features.length;
  await page.close();
  console.log(
    `== Atlas render: ${count('yards')} yards, ${count('sites')} sites, ${count('moves')} move lines, ${count('drops')} drops, ${count('sprayNotices')} spray notices (${(atlasJson.length / 1024).toFixed(0)} KiB JSON) on ${today}; setup ${((performance.now() - started) / 1000).toFixed(1)} s`,
  );

  bare = http.createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://x');
    if (url.pathname === '/atlas.json') {
      res.writeHead(200, { 'Content-Type': 'application/json' }).end(atlasJson);
    } else if (url.pathname.startsWith('/leaflet/')) {
      const name = path.basename(url.pathname);
      try {
        const type = name.endsWith('.css') ? 'text/css' : 'text/javascript';
        res
          .writeHead(200, { 'Content-Type': type })
          .end(readFileSync(path.join(leafletDist, name)));
      } catch {
        res.writeHead(404).end();
      }
    } else {
      res.writeHead(200, { 'Content-Type': 'text/html' }).end(barePage);
    }
  });
  await new Promise<void>((resolve) => bare!.listen(0, '127.0.0.1', resolve));
  const bareOrigin = `http://127.0.0.1:${(bare.address() as AddressInfo).port}`;

  const oursRuns: Timing[] = [];
  const bareRuns: Timing[] = [];
  for (let i = 0; i <= RUNS; i++) {
    const a = await bench.newPage();
    const oursRun = await timeRender(a, `${bench.origin}/atlas`, '/api/atlas');
    await a.close();
    const b = await bench.newPage();
    const bareRun = await timeRender(b, `${bareOrigin}/`, '/atlas.json');
    await b.close();
    if (i > 0) {
      oursRuns.push(oursRun);
      bareRuns.push(bareRun);
    }
  }
  const o = report(
    'Atlas (/atlas): navigation -> API + canvas painted + network idle',
    oursRuns.map((r) => r.total),
  );
  const p = report(
    'bare Leaflet page, same GeoJSON, preferCanvas, no tiles',
    bareRuns.map((r) => r.total),
  );
  console.log(`   ratio ours / bare (medians): ${(o.median / p.median).toFixed(2)}`);
  const phase = (runs: Timing[], key: 'api' | 'painted') =>
    stats(runs.map((r) => r[key])).median.toFixed(0);
  console.log(
    `   phases (medians, ms from navigation start): ours API ${phase(oursRuns, 'api')}, canvas painted ${phase(oursRuns, 'painted')}; bare JSON ${phase(bareRuns, 'api')}, canvas painted ${phase(bareRuns, 'painted')}`,
  );
  console.log(
    '   (the end is the last request finished, not the 500 ms of quiet that network idle waits for; ours also loads its basemap tiles)',
  );
} finally {
  bare?.close();
  await bench.close();
}

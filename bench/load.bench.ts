/**
 * `npm run bench:load`: autocannon against the running app with signed-in owners, planners, crew
 * and growers (7 reads : 3 writes; BENCH_REQUESTS in all, default 3,000), then a reconciliation of what was written against what was
 * answered 2xx, then the same list of 200 yards from a bare Express + pg endpoint for a ratio.
 * Loopback only; bounded in time. Expects BASE_URL and DATABASE_URL (scripts/bench-load.sh).
 */
import 'reflect-metadata';
import { randomUUID } from 'node:crypto';
import { spawn } from 'node:child_process';
import autocannon from 'autocannon';
import pg from 'pg';

const base = process.env.BASE_URL!;
const requestsInAll = Number(process.env.BENCH_REQUESTS ?? 3000);
const connections = Number(process.env.BENCH_CONNECTIONS ?? 16);
const pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 10 });
const one = async <T>(sql: string, params: unknown[] = []) =>
  (await pool.query(sql, params)).rows[0] as T;

interface Session {
  cookie: string;
  csrf: string;
}

async function signIn(email: string): Promise<Session> {
  const first = await fetch(`${base}/api/session`);
  const cookie0 = first.headers.get('set-cookie')!.split(';')[0];
  const { csrfToken } = (await first.json()) as { csrfToken: string };
  const response = await fetch(`${base}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-csrf-token': csrfToken, cookie: cookie0 },
    body: JSON.stringify({ email, password: 'duskhaul-demo' }),
  });
  if (!response.ok) throw new Error(`sign-in as ${email}: ${response.status}`);
  const body = (await response.json()) as { csrfToken: string };
  return { cookie: response.headers.get('set-cookie')!.split(';')[0], csrf: body.csrfToken };
}

const headers = (s: Session, json = false) => ({
  cookie: s.cookie,
  'x-csrf-token': s.csrf,
  ...(json ? { 'content-type': 'application/json' } : {}),
});

type Timed = autocannon.Result & { elapsedMs: number; latenciesMs: number[] };

/**
 * Runs autocannon and times it to its last response: autocannon notices the end only on its
 * once-a-second tick, so its own average and start/finish come in whole seconds.
 */
async function timedRun(options: autocannon.Options): Promise<Timed> {
  const started = performance.now();
  let lastResponse = started;
  const latenciesMs: number[] = [];
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon(options, (error, done) => (error ? reject(error) : resolve(done)));
    instance.on('response', (_client, _status, _bytes, responseTime: number) => {
      lastResponse = performance.now();
      latenciesMs.push(responseTime);
    });
  });
  return { ...result, elapsedMs: lastResponse - started, latenciesMs };
}

/** Requests answered per second over the whole run. */
const rateOf = (r: Timed) => r.requests.total / (r.elapsedMs / 1000);

/** The p-th percentile (nearest rank) of every response's latency, in ms. */
function percentile(values: number[], p: number): number {
  if (values.length === 0) return NaN;
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}
const ms = (value: number) => `${value.toFixed(0).padStart(4)} ms`;

function summarise(name: string, r: Timed) {
  const errors = r.errors + r.timeouts;
  const fiveXx = r['5xx'];
  const rate = rateOf(r);
  console.log(
    `${name.padEnd(34)} ${rate.toFixed(0).padStart(6)} req/s  p50 ${ms(percentile(r.latenciesMs, 50))}  p95 ${ms(percentile(r.latenciesMs, 95))}  p99 ${ms(percentile(r.latenciesMs, 99))}  2xx ${r['2xx']}  4xx ${r['4xx']}  5xx ${fiveXx}  socket errors ${errors}`,
  );
  return { fiveXx, errors, rate };
}

async function main() {
  const operation = await one<{ id: string }>(
    `SELECT id FROM operations WHERE name = 'Mesquite Flats Apiaries'`,
  );
  const lot = await one<{ id: string }>(
    `SELECT id FROM colony_lots WHERE operation_id = $1 ORDER BY name LIMIT 1`,
    [operation.id],
  );
  const move = await one<{ id: string }>(
    `SELECT id FROM moves WHERE operation_id = $1 AND status = 'planned' ORDER BY night_of LIMIT 1`,
    [operation.id],
  );
  // A yard of its own for the writes, and 200 yards to list.
  const benchYard = await one<{ id: string }>(
    `INSERT INTO yards (operation_id, name, latitude, longitude, capacity) VALUES ($1, 'Bench yard', 28, -98, 100000) RETURNING id`,
    [operation.id],
  );
  const existing = await one<{ n: number }>(
    `SELECT count(*)::int AS n FROM yards WHERE operation_id = $1 AND archived_at IS NULL`,
    [operation.id],
  );
  await pool.query(
    `INSERT INTO yards (operation_id, name, latitude, longitude, capacity)
     SELECT $1, 'Listed yard ' || g, 28 + g / 1000.0, -98, 100 FROM generate_series(1, $2::int) g`,
    [operation.id, Math.max(0, 200 - existing.n)],
  );

  const [owner, planner, crew, grower] = await Promise.all(
    ['owner@demo.test', 'planner@demo.test', 'crew@demo.test', 'grower@demo.test'].map(signIn),
  );
  /** What the writes under load leave behind, counted before and after for the reconciliation. */
  const written = async () => ({
    ledger: (
      await one<{ n: number }>(`SELECT count(*)::int AS n FROM ledger_entries WHERE to_id = $1`, [
        benchYard.id,
      ])
    ).n,
    weights: (
      await one<{ n: number }>(`SELECT count(*)::int AS n FROM weight_samples WHERE move_id = $1`, [
        move.id,
      ])
    ).n,
    yards: (
      await one<{ n: number }>(
        `SELECT count(*)::int AS n FROM yards WHERE operation_id = $1 AND name LIKE 'Bench created %'`,
        [operation.id],
      )
    ).n,
  });
  const before = await written();
  const ok = { ledger: 0, weights: 0, yards: 0 };
  const loadPlan = JSON.stringify({
    colonies: 416,
    coloniesPerPallet: 4,
    palletTareKg: 20,
    hiveWeightKg: { mean: 48, sd: 6, samples: 24 },
    trucks: [
      { id: 'a', payloadKg: 21500, palletSpots: 26, tiers: 2 },
      { id: 'b', payloadKg: 21500, palletSpots: 26, tiers: 2 },
    ],
  });

  // A fixed number of requests (not a duration), so every write is answered before counting.
  console.log(
    `Mixed traffic: ${requestsInAll} requests over ${connections} connections against ${base}`,
  );
  const mixed = await timedRun({
    url: base,
    connections,
    amount: requestsInAll,
    timeout: 30,
    requests: [
      { method: 'GET', path: '/api/yards?limit=200', headers: headers(owner) },
      { method: 'GET', path: '/api/contracts', headers: headers(planner) },
      { method: 'GET', path: '/api/moves', headers: headers(crew) },
      { method: 'GET', path: '/api/contracts', headers: headers(grower) },
      { method: 'GET', path: `/api/yards/${benchYard.id}`, headers: headers(planner) },
      { method: 'POST', path: '/api/calc/load-plan', headers: headers(crew, true), body: loadPlan },
      { method: 'GET', path: '/api/ledger/counts', headers: headers(owner) },
      {
        method: 'POST',
        path: '/api/ledger',
        headers: headers(planner, true),
        body: JSON.stringify({
          lotId: lot.id,
          kind: 'purchase',
          occurredOn: '2026-11-01',
          colonies: 1,
          to: { kind: 'yard', id: benchYard.id },
          reason: 'bench',
        }),
        onResponse: (status: number) => {
          if (status >= 200 && status < 300) ok.ledger++;
        },
      },
      {
        method: 'POST',
        path: '/api/moves/sync',
        headers: headers(crew, true),
        setupRequest: (request: autocannon.Request) => ({
          ...request,
          body: JSON.stringify({
            changes: [
              {
                idempotencyKey: randomUUID(),
                kind: 'weights',
                moveId: move.id,
                payload: { weightsKg: [48.5, 51.2] },
              },
            ],
          }),
        }),
        onResponse: (status: number, body: string) => {
          if (
            status === 200 &&
            (JSON.parse(body) as { results: Array<{ outcome: string }> }).results[0]?.outcome ===
              'applied'
          )
            ok.weights++;
        },
      },
      {
        method: 'POST',
        path: '/api/yards',
        headers: headers(owner, true),
        setupRequest: (request: autocannon.Request) => ({
          ...request,
          body: JSON.stringify({
            name: `Bench created ${randomUUID().slice(0, 8)}`,
            latitude: 28,
            longitude: -98,
            capacity: 10,
          }),
        }),
        onResponse: (status: number) => {
          if (status === 201) ok.yards++;
        },
      },
    ],
  });
  const mixedResult = summarise('mixed 70 % reads / 30 % writes', mixed);

  const after = await written();

  const colonies = (
    await one<{ n: number }>(
      `SELECT COALESCE(SUM(colonies), 0)::int AS n FROM ledger_entries WHERE to_id = $1`,
      [benchYard.id],
    )
  ).n;
  const reconciled =
    after.ledger - before.ledger === ok.ledger &&
    colonies === after.ledger &&
    after.weights - before.weights === ok.weights &&
    after.yards - before.yards === ok.yards;
  console.log(
    `reconciliation: ledger entries +${after.ledger - before.ledger} for ${ok.ledger} answered 2xx (bench yard holds ${colonies} colonies); ` +
      `synced weight samples +${after.weights - before.weights} for ${ok.weights} applied; yards +${after.yards - before.yards} for ${ok.yards} created → ${reconciled ? 'reconciled' : 'MISMATCH'}`,
  );

  // The same 200 rows, signed in through the whole stack vs a bare Express + pg endpoint.
  const listed = await timedRun({
    url: `${base}/api/yards?limit=200`,
    connections,
    amount: Math.round(requestsInAll / 3),
    headers: headers(owner),
  });
  const ours = summarise('GET /api/yards?limit=200 (signed in)', listed);
  // The bare endpoint runs in a process of its own, as the app does, so neither shares a thread
  // with autocannon.
  const bare = spawn(process.execPath, ['--import', 'tsx', 'bench/support/bare-yards-server.ts'], {
    env: { ...process.env, OPERATION_ID: operation.id },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const barePort = await new Promise<number>((resolve, reject) => {
    bare.once('exit', (code) => reject(new Error(`bare server exited (${code})`)));
    bare.stdout.on('data', (chunk: Buffer) => {
      const ready = /bare-ready (\d+)/.exec(String(chunk));
      if (ready) resolve(Number(ready[1]));
    });
  });
  const bareResult = await timedRun({
    url: `http://127.0.0.1:${barePort}/yards`,
    connections,
    amount: Math.round(requestsInAll / 3),
  });
  const bareSummary = summarise('bare Express + pg, same rows', bareResult);
  bare.kill('SIGTERM');
  const ratio = ours.rate / bareSummary.rate;
  console.log(`throughput ratio, ours ÷ bare: ${ratio.toFixed(2)}× (target ≥ 0.8×)`);

  await pool.end();
  const clean =
    mixedResult.fiveXx === 0 && mixedResult.errors === 0 && ours.fiveXx === 0 && reconciled;
  console.log(
    clean
      ? 'load bench: zero 5xx, zero socket errors, counts reconciled'
      : 'load bench: PROBLEMS (see above)',
  );
  process.exit(clean ? 0 : 1);
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});

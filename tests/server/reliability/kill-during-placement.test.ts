import { spawn, type ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { createServer } from 'node:net';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from '../../support/test-app';
import {
  buyColonies,
  createCrew,
  createLot,
  createYard,
  testPassword,
} from '../../support/factories';

/**
 * The server process is killed (SIGKILL) in the middle of placing a move: the placement's
 * transaction has written its first ledger entry and waits on a lock the test holds. After a
 * restart none of its rows exist, and the same change sent again applies exactly once.
 */

const freePort = () =>
  new Promise<number>((resolve) => {
    const s = createServer().listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });

async function startServer(port: number): Promise<ChildProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: { ...process.env, PORT: String(port), CLIENT_DIST: 'none', NODE_ENV: 'test' },
    stdio: 'ignore',
  });
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    try {
      if ((await fetch(`http://127.0.0.1:${port}/api/health`)).ok) return child;
    } catch {
      // not up yet
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  child.kill('SIGKILL');
  throw new Error('the server did not start');
}

/** Signs in over HTTP, keeping the cookie and CSRF token by hand. */
async function signIn(base: string, email: string) {
  const first = await fetch(`${base}/api/session`);
  const cookie = first.headers.get('set-cookie')!.split(';')[0];
  const { csrfToken } = (await first.json()) as { csrfToken: string };
  const response = await fetch(`${base}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-csrf-token': csrfToken, cookie },
    body: JSON.stringify({ email, password: testPassword }),
  });
  const body = (await response.json()) as { csrfToken: string };
  return { cookie: response.headers.get('set-cookie')!.split(';')[0], csrf: body.csrfToken };
}

let t: TestApp;
let server: ChildProcess | undefined;

beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  server?.kill('SIGKILL');
  await t.close();
});

describe('when the server is killed during a move placement', () => {
  it('then none of its rows exist after a restart, and the same idempotency key applies exactly once', async () => {
    const people = await createCrew(t.db);
    const op = people.operationId;
    const [lotA, lotB] = [await createLot(t.db, op), await createLot(t.db, op)];
    const yard = await createYard(t.db, op, 'Kill origin');
    const destination = await createYard(t.db, op, 'Kill destination');
    await buyColonies(t.db, op, lotA, yard, 30, '2026-10-01');
    await buyColonies(t.db, op, lotB, yard, 30, '2026-10-01');
    const [move] = await t.db.query(
      `INSERT INTO moves (operation_id, name, night_of, status, destination_kind, destination_ids, version)
       VALUES ($1, 'Interrupted haul', '2027-01-20', 'rolling', 'yard', ARRAY[$2]::uuid[], 4) RETURNING id`,
      [op, destination],
    );
    await t.db.query(
      `INSERT INTO move_origins (operation_id, move_id, yard_id, lot_id, colonies, pickup_order) VALUES ($1, $2, $3, $4, 20, 0), ($1, $2, $3, $5, 20, 1)`,
      [op, move.id, yard, lotA, lotB],
    );
    const change = {
      idempotencyKey: `kill-${randomUUID()}`,
      kind: 'status',
      moveId: move.id,
      version: 4,
      payload: { status: 'placed' },
    };

    const port = await freePort();
    const base = `http://127.0.0.1:${port}`;
    server = await startServer(port);
    const crew = await signIn(base, people.crew.email);
    const send = () =>
      fetch(`${base}/api/moves/sync`, {
        method: 'POST',
        headers: {
          'content-type': 'application/json',
          'x-csrf-token': crew.csrf,
          cookie: crew.cookie,
        },
        body: JSON.stringify({ changes: [change] }),
      });

    // Hold the second lot's ledger lock so the placement stops half-way through its transaction.
    const holder = new pg.Client({ connectionString: process.env.DATABASE_URL });
    await holder.connect();
    await holder.query('BEGIN');
    await holder.query(`SELECT pg_advisory_xact_lock(hashtextextended($1 || ':' || $2, 0))`, [
      op,
      lotB,
    ]);
    const inFlight = send().catch(() => 'connection lost');
    let waiting = 0;
    for (let i = 0; i < 100 && waiting === 0; i++) {
      await new Promise((resolve) => setTimeout(resolve, 100));
      const [row] = await t.db.query(
        `SELECT count(*)::int AS n FROM pg_stat_activity WHERE application_name = 'duskhaul' AND wait_event_type = 'Lock' AND wait_event = 'advisory'`,
      );
      waiting = row.n;
    }
    expect(waiting, 'the placement reached the held lock').toBe(1);
    server.kill('SIGKILL');
    expect(await inFlight).toBe('connection lost');
    await holder.query('COMMIT');
    await holder.end();

    // PostgreSQL rolls the dead connection's transaction back: nothing of the placement remains.
    const entriesOf = async () =>
      (
        await t.db.query(`SELECT count(*)::int AS n FROM ledger_entries WHERE move_id = $1`, [
          move.id,
        ])
      )[0].n;
    await expect.poll(entriesOf, { timeout: 5_000 }).toBe(0);
    expect((await t.db.query(`SELECT status FROM moves WHERE id = $1`, [move.id]))[0].status).toBe(
      'rolling',
    );
    expect(
      await t.db.query(`SELECT 1 FROM idempotency_keys WHERE key LIKE '%' || $1`, [
        change.idempotencyKey,
      ]),
    ).toHaveLength(0);

    server = await startServer(port);
    const again = await signIn(base, people.crew.email);
    Object.assign(crew, again);
    const first = (await (await send()).json()) as { results: Array<{ outcome: string }> };
    const second = (await (await send()).json()) as { results: Array<{ outcome: string }> };
    expect([first.results[0].outcome, second.results[0].outcome]).toEqual(['applied', 'duplicate']);
    expect(await entriesOf()).toBe(2);
    expect((await t.db.query(`SELECT status FROM moves WHERE id = $1`, [move.id]))[0].status).toBe(
      'placed',
    );
  }, 90_000);
});

import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInClient, startTestApp, type Client, type TestApp } from '../../../support/test-app';
import { createOperation, createUser, testPassword } from '../../../support/factories';
import { createMoveWorld, twoYardMove, type MoveWorld } from './move-world';

let t: TestApp;
let w: MoveWorld;
let planner: Client;
let crew: Client;
let grower: Client;
let stranger: Client;

beforeAll(async () => {
  t = await startTestApp();
  w = await createMoveWorld(t.db);
  planner = await signedInClient(t.app, w.planner.email, testPassword);
  crew = await signedInClient(t.app, w.crew.email, testPassword);
  grower = await signedInClient(t.app, w.growerUserA.email, testPassword);
  const elsewhere = await createUser(t.db, await createOperation(t.db, 'Elsewhere'), 'owner');
  stranger = await signedInClient(t.app, elsewhere.email, testPassword);
});
afterAll(() => t.close());

/** A planned two-truck move (each test its own night, so promises never collide). */
async function plannedMove(nightOf: string, colonies = [20, 10]) {
  const { body: move } = await planner
    .post(
      '/api/moves',
      twoYardMove(w, {
        name: `Run ${nightOf}`,
        nightOf,
        origins: [
          { yardId: w.yardA, lotId: w.weighedLot, colonies: colonies[0] },
          { yardId: w.yardB, lotId: w.unweighedLot, colonies: colonies[1] },
        ],
      }),
    )
    .expect(201);
  const { body } = await planner
    .post(`/api/moves/${move.id}/status`, { version: move.version, status: 'planned' })
    .expect(200);
  return body as { id: string; version: number; loads: Array<{ id: string; version: number }> };
}

const ledgerOf = async (moveId: string) =>
  t.db.query(
    `SELECT kind, colonies, from_id FROM ledger_entries WHERE move_id = $1 ORDER BY colonies`,
    [moveId],
  );

/** The truck of a planned move that calls at both yards, and load-counts changes on it. */
async function twoStopTruck(moveId: string) {
  const { body: full } = await planner.get(`/api/moves/${moveId}`).expect(200);
  const load = full.loads.find(
    (l: { plan: { stops: unknown[] } }) => l.plan.stops.length === 2,
  ) as {
    id: string;
    version: number;
    plan: { stops: Array<{ yardId: string; lotId: string; colonies: number }> };
  };
  expect(load, 'one truck calls at both yards').toBeDefined();
  const [first, second] = load.plan.stops.map(({ yardId, lotId }) => ({ yardId, lotId }));
  const counts = (payload: Record<string, unknown>) => ({
    idempotencyKey: randomUUID(),
    kind: 'load-counts',
    moveId,
    loadId: load.id,
    version: load.version,
    payload,
  });
  return { load, first, second, counts };
}

/** The crew's sync of `changes`, answered 200; its per-change results. */
const crewSync = async (changes: unknown[]) =>
  (await crew.post('/api/moves/sync', { changes }).expect(200)).body.results;

describe('POST /api/moves/sync', () => {
  it('when the same batch is sent twice then it applies once and the second answer says duplicate', async () => {
    const move = await plannedMove('2027-02-02');
    const [load1, load2] = move.loads;
    const batch = {
      changes: [
        {
          idempotencyKey: randomUUID(),
          kind: 'load-counts',
          moveId: move.id,
          loadId: load1.id,
          version: load1.version,
          payload: {
            palletsLoaded: 5,
            preRollCheck: {
              netsClipped: true,
              strapsTight: true,
              palletsClean: true,
              waterAboard: true,
              certificateInCab: false,
            },
          },
        },
        {
          idempotencyKey: randomUUID(),
          kind: 'note',
          moveId: move.id,
          loadId: load2.id,
          payload: { text: 'Two pallets wet from the sprinkler.' },
        },
        {
          idempotencyKey: randomUUID(),
          kind: 'weights',
          moveId: move.id,
          payload: { yardId: w.yardB, lotId: w.unweighedLot, weightsKg: [41.5, 44, 39.8] },
        },
        {
          idempotencyKey: randomUUID(),
          kind: 'status',
          moveId: move.id,
          version: move.version,
          payload: { status: 'loading' },
        },
      ],
    };
    const first = (await crew.post('/api/moves/sync', batch).expect(200)).body.results;
    expect(first.map((r: { outcome: string }) => r.outcome)).toEqual([
      'applied',
      'applied',
      'applied',
      'applied',
    ]);
    expect(first[0].record).toMatchObject({ palletsLoaded: 5, version: 2 });
    expect(first[1].record.notes).toBe('Test crew: Two pallets wet from the sprinkler.');
    expect(first[3].record.status).toBe('loading');

    const second = (await crew.post('/api/moves/sync', batch).expect(200)).body.results;
    expect(second.map((r: { outcome: string }) => r.outcome)).toEqual([
      'duplicate',
      'duplicate',
      'duplicate',
      'duplicate',
    ]);
    expect(second[0].record).toEqual(first[0].record);

    const [{ version: loadVersion, notes }] = await t.db.query(
      `SELECT version, notes FROM move_loads WHERE id = $1`,
      [load2.id],
    );
    expect({ loadVersion, notes }).toEqual({
      loadVersion: 2,
      notes: 'Test crew: Two pallets wet from the sprinkler.',
    });
    const samples = await t.db.query(`SELECT weights_kg FROM weight_samples WHERE move_id = $1`, [
      move.id,
    ]);
    expect(samples).toEqual([{ weights_kg: [41.5, 44, 39.8] }]);
    const [{ status, version }] = await t.db.query(
      `SELECT status, version FROM moves WHERE id = $1`,
      [move.id],
    );
    expect({ status, version }).toEqual({ status: 'loading', version: move.version + 1 });

    // The same key with a different change is refused, not applied.
    const reused = (
      await crew
        .post('/api/moves/sync', {
          changes: [{ ...batch.changes[1], payload: { text: 'Something else' } }],
        })
        .expect(200)
    ).body.results[0];
    expect(reused).toMatchObject({ outcome: 'rejected', status: 422 });
  });

  it('when a change carries a stale version then it comes back as a conflict with the current record', async () => {
    const move = await plannedMove('2027-02-04');
    const [load] = move.loads;
    await planner
      .patch(`/api/moves/${move.id}/loads/${load.id}`, { version: load.version, palletsLoaded: 4 })
      .expect(200);
    const [result] = (
      await crew
        .post('/api/moves/sync', {
          changes: [
            {
              idempotencyKey: randomUUID(),
              kind: 'load-counts',
              moveId: move.id,
              loadId: load.id,
              version: load.version,
              payload: { palletsLoaded: 6 },
            },
          ],
        })
        .expect(200)
    ).body.results;
    expect(result).toMatchObject({
      outcome: 'conflict',
      status: 409,
      current: { id: load.id, palletsLoaded: 4, version: load.version + 1 },
    });
    // The direct route answers the same stale write with 409 and the current load.
    const direct = await crew
      .patch(`/api/moves/${move.id}/loads/${load.id}`, { version: load.version, palletsLoaded: 6 })
      .expect(409);
    expect(direct.body.error.details.current.palletsLoaded).toBe(4);
  });

  it('when placing arrives by sync then the ledger is written once, however often it is sent', async () => {
    const move = await plannedMove('2027-02-06');
    const change = (status: string, version: number) => ({
      idempotencyKey: randomUUID(),
      kind: 'status',
      moveId: move.id,
      version,
      payload: { status },
    });
    const batch = {
      changes: [
        change('loading', move.version),
        change('rolling', move.version + 1),
        change('placed', move.version + 2),
      ],
    };
    const first = (await crew.post('/api/moves/sync', batch).expect(200)).body.results;
    expect(first.map((r: { outcome: string }) => r.outcome)).toEqual([
      'applied',
      'applied',
      'applied',
    ]);
    await crew.post('/api/moves/sync', batch).expect(200);
    await crew.post('/api/moves/sync', batch).expect(200);
    expect(await ledgerOf(move.id)).toEqual([
      { kind: 'move', colonies: 10, from_id: w.yardB },
      { kind: 'move', colonies: 20, from_id: w.yardA },
    ]);
    // A new key for the same placing is a conflict (already placed), not a second entry.
    const [again] = (
      await crew
        .post('/api/moves/sync', { changes: [change('placed', move.version + 3)] })
        .expect(200)
    ).body.results;
    expect(again).toMatchObject({
      outcome: 'conflict',
      current: { id: move.id, status: 'placed' },
    });
    expect(await ledgerOf(move.id)).toHaveLength(2);
  });

  it('when placing dies between its two ledger entries then nothing of it is written, and a retry applies', async () => {
    const move = await plannedMove('2027-02-08');
    for (const [status, version] of [
      ['loading', move.version],
      ['rolling', move.version + 1],
    ] as const) {
      await crew.post(`/api/moves/${move.id}/status`, { version, status }).expect(200);
    }
    const suffix = randomUUID().replaceAll('-', '');
    // A trigger that kills the transaction at this move's second ledger entry.
    await t.db.query(`
      CREATE FUNCTION fail_second_entry_${suffix}() RETURNS trigger AS $$
      BEGIN
        IF NEW.move_id = '${move.id}' AND EXISTS (SELECT 1 FROM ledger_entries WHERE move_id = NEW.move_id) THEN
          RAISE EXCEPTION 'simulated crash between ledger entries';
        END IF;
        RETURN NEW;
      END $$ LANGUAGE plpgsql;
      CREATE TRIGGER fail_second_entry_${suffix} BEFORE INSERT ON ledger_entries
        FOR EACH ROW EXECUTE FUNCTION fail_second_entry_${suffix}();`);
    const batch = {
      changes: [
        {
          idempotencyKey: randomUUID(),
          kind: 'status',
          moveId: move.id,
          version: move.version + 2,
          payload: { status: 'placed' },
        },
      ],
    };
    try {
      const [result] = (await crew.post('/api/moves/sync', batch).expect(200)).body.results;
      expect(result).toMatchObject({ outcome: 'failed', status: 500 });
      expect(JSON.stringify(result)).not.toMatch(/simulated|ledger_entries/);
    } finally {
      await t.db.query(`
        DROP TRIGGER fail_second_entry_${suffix} ON ledger_entries;
        DROP FUNCTION fail_second_entry_${suffix}();`);
    }
    expect(await ledgerOf(move.id)).toEqual([]);
    const [{ status }] = await t.db.query(`SELECT status FROM moves WHERE id = $1`, [move.id]);
    expect(status).toBe('rolling');
    expect(
      await t.db.query(`SELECT 1 FROM idempotency_keys WHERE operation_id = $1 AND key = $2`, [
        w.operationId,
        `move-sync:${batch.changes[0].idempotencyKey}`,
      ]),
    ).toHaveLength(0);

    const [retry] = (await crew.post('/api/moves/sync', batch).expect(200)).body.results;
    expect(retry.outcome).toBe('applied');
    expect(await ledgerOf(move.id)).toHaveLength(2);
  });

  it('when a change is malformed or not allowed then it is answered, and the others still apply', async () => {
    const move = await plannedMove('2027-02-10');
    const results = (
      await crew
        .post('/api/moves/sync', {
          changes: [
            { idempotencyKey: 'short', kind: 'note', moveId: move.id, payload: { text: 'x' } },
            {
              idempotencyKey: randomUUID(),
              kind: 'status',
              moveId: move.id,
              version: move.version,
              payload: { status: 'cancelled' }, // crew do not cancel
            },
            {
              idempotencyKey: randomUUID(),
              kind: 'note',
              moveId: move.id,
              payload: { text: 'Left the water trailer at the yard.' },
            },
          ],
        })
        .expect(200)
    ).body.results;
    expect(results.map((r: { outcome: string; status: number }) => [r.outcome, r.status])).toEqual([
      ['rejected', 400],
      ['rejected', 403],
      ['applied', 200],
    ]);
    expect(results[0].error.details[0].field).toBe('idempotencyKey');
  });

  it('when a grower syncs then 403; when another operation syncs this move then its change is a 404 and nothing changes', async () => {
    const move = await plannedMove('2027-02-12');
    const change = {
      idempotencyKey: randomUUID(),
      kind: 'note',
      moveId: move.id,
      payload: { text: 'not mine' },
    };
    await grower.post('/api/moves/sync', { changes: [change] }).expect(403);
    const [result] = (await stranger.post('/api/moves/sync', { changes: [change] }).expect(200))
      .body.results;
    expect(result).toMatchObject({ outcome: 'rejected', status: 404 });
    const [{ notes }] = await t.db.query(`SELECT notes FROM moves WHERE id = $1`, [move.id]);
    expect(notes).toBe('');
    await planner.post('/api/moves/sync', { changes: [] }).expect(400);
  });
  it('when the crew counts pallets per pick-up yard then the truck total is their sum, and a stop the truck does not make is refused', async () => {
    const move = await plannedMove('2027-02-14', [40, 20]);
    const { load, first, second, counts } = await twoStopTruck(move.id);
    const refused = await crewSync([
      counts({ palletsByStop: [{ yardId: w.yardA, lotId: w.unweighedLot, pallets: 3 }] }),
      counts({
        palletsByStop: [
          { ...first, pallets: 3 },
          { ...first, pallets: 1 },
        ],
      }),
      counts({ palletsByStop: [{ ...first, pallets: 3 }], palletsLoaded: 4 }),
    ]);
    expect(
      refused.map(
        (r: { error: { details: Array<{ field: string }> } }) => r.error.details[0].field,
      ),
    ).toEqual(['palletsByStop.0', 'palletsByStop.1', 'palletsLoaded']);
    const [untouched] = await t.db.query(
      `SELECT pallets_loaded, pallets_by_stop, version FROM move_loads WHERE id = $1`,
      [load.id],
    );
    expect(untouched).toEqual({
      pallets_loaded: null,
      pallets_by_stop: null,
      version: load.version,
    });

    const [applied] = await crewSync([
      counts({
        palletsByStop: [
          { ...first, pallets: 5 },
          { ...second, pallets: 2 },
        ],
      }),
    ]);
    expect(applied.record).toMatchObject({
      palletsLoaded: 7,
      palletsByStop: [
        { ...first, pallets: 5 },
        { ...second, pallets: 2 },
      ],
    });
    const { body: sheet } = await planner.get(`/api/moves/${move.id}/load-sheet`).expect(200);
    const page = sheet.pages.find((p: { loadId: string }) => p.loadId === load.id);
    expect(page.recorded).toMatchObject({
      palletsLoaded: 7,
      palletsByStop: applied.record.palletsByStop,
    });

    // A bare truck total afterwards replaces the per-stop counts it no longer agrees with.
    await crew
      .patch(`/api/moves/${move.id}/loads/${load.id}`, {
        version: applied.record.version,
        palletsLoaded: 6,
      })
      .expect(200);
    const [after] = await t.db.query(
      `SELECT pallets_loaded, pallets_by_stop FROM move_loads WHERE id = $1`,
      [load.id],
    );
    expect(after).toEqual({ pallets_loaded: 6, pallets_by_stop: null });
  });
  it('when the crew record colonies left behind at one yard of a two-yard truck then placing keeps exactly those in that yard', async () => {
    const planned = { [w.yardA]: 40, [w.yardB]: 20 };
    const move = await plannedMove('2027-02-16', [planned[w.yardA], planned[w.yardB]]);
    const { load, first, second, counts } = await twoStopTruck(move.id);
    const secondStop = load.plan.stops[1];
    const refused = await crewSync([
      counts({ leftBehindByStop: [{ yardId: w.yardA, lotId: w.yardA, colonies: 3 }] }),
      counts({ leftBehindByStop: [{ ...first, colonies: 3 }], coloniesLeftBehind: 5 }),
      counts({ leftBehindByStop: [{ ...second, colonies: 500 }] }),
    ]);
    expect(
      refused.map(
        (r: { error: { details: Array<{ field: string; message: string }> } }) =>
          r.error.details[0],
      ),
    ).toEqual([
      { field: 'leftBehindByStop.0', message: 'Not a pick-up stop of this truck.' },
      { field: 'coloniesLeftBehind', message: 'The stops add up to 3, not 5.' },
      {
        field: 'leftBehindByStop.0.colonies',
        message: `More than the ${secondStop.colonies} colonies this truck takes here.`,
      },
    ]);

    const [applied] = await crewSync([
      counts({
        leftBehindByStop: [
          { ...first, colonies: 3 },
          { ...second, colonies: 0 },
        ],
      }),
    ]);
    expect(applied.record).toMatchObject({
      coloniesLeftBehind: 3,
      leftBehindByStop: [
        { ...first, colonies: 3 },
        { ...second, colonies: 0 },
      ],
    });
    let version = move.version;
    for (const status of ['loading', 'rolling', 'placed']) {
      version = (await crew.post(`/api/moves/${move.id}/status`, { version, status }).expect(200))
        .body.version;
    }
    // Shared out over both origins (40 : 20) the 3 would leave 2 in one yard and 1 in the other;
    // counted per stop, all 3 stay in the yard they were left in.
    const movedFrom = async (yardId: string) =>
      (
        await t.db.query(
          `SELECT coalesce(sum(colonies), 0)::int AS n FROM ledger_entries
            WHERE move_id = $1 AND kind = 'move' AND from_id = $2`,
          [move.id, yardId],
        )
      )[0].n;
    expect(await movedFrom(first.yardId)).toBe(planned[first.yardId] - 3);
    expect(await movedFrom(second.yardId)).toBe(planned[second.yardId]);
  });
});

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInClient, startTestApp, type Client, type TestApp } from '../../../support/test-app';
import {
  buyColonies,
  createCrew,
  createLot,
  createYard,
  testPassword,
} from '../../../support/factories';

let t: TestApp;
let planner: Client;
let crew: Client;
let operationId: string;
let lot: string;
let yard: string;
let destination: string;

beforeAll(async () => {
  t = await startTestApp();
  const people = await createCrew(t.db);
  operationId = people.operationId;
  planner = await signedInClient(t.app, people.planner.email, testPassword);
  crew = await signedInClient(t.app, people.crew.email, testPassword);
  lot = await createLot(t.db, operationId);
  yard = await createYard(t.db, operationId, 'Origin');
  destination = await createYard(t.db, operationId, 'Destination');
  await buyColonies(t.db, operationId, lot, yard, 100, '2026-10-01');
});
afterAll(() => t.close());

const draft = async (colonies: number, nightOf = '2027-01-20') =>
  (
    await planner
      .post('/api/moves', {
        name: `Haul ${colonies}`,
        nightOf,
        destinationKind: 'yard',
        destinationIds: [destination],
        origins: [{ yardId: yard, lotId: lot, colonies }],
      })
      .expect(201)
  ).body;

describe('/api/moves', () => {
  it('when two moves would promise the same colonies then planning the second is refused', async () => {
    const first = await draft(70);
    const second = await draft(40);
    await planner
      .post(`/api/moves/${first.id}/status`, { version: 1, status: 'planned' })
      .expect(200);
    const refused = await planner
      .post(`/api/moves/${second.id}/status`, { version: 1, status: 'planned' })
      .expect(409);
    expect(refused.body.error.details).toMatchObject({ there: 100, promised: 70, wanted: 40 });
    // Cancelling the first frees its colonies.
    await planner
      .post(`/api/moves/${first.id}/status`, { version: 2, status: 'cancelled' })
      .expect(200);
    await planner
      .post(`/api/moves/${second.id}/status`, { version: 1, status: 'planned' })
      .expect(200);
    await planner
      .post(`/api/moves/${second.id}/status`, { version: 2, status: 'cancelled' })
      .expect(200);
  });

  it('when two planners plan at the same moment for the same colonies then exactly one wins', async () => {
    const a = await draft(60);
    const b = await draft(60);
    const results = await Promise.all([
      planner.post(`/api/moves/${a.id}/status`, { version: 1, status: 'planned' }),
      planner.post(`/api/moves/${b.id}/status`, { version: 1, status: 'planned' }),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    const winner = results[0].status === 200 ? a : b;
    await planner
      .post(`/api/moves/${winner.id}/status`, { version: 2, status: 'cancelled' })
      .expect(200);
  });

  it('when a move is placed then the ledger moves its colonies in one step and the counts reconcile', async () => {
    const move = await draft(30, '2027-01-22');
    await planner
      .post(`/api/moves/${move.id}/status`, { version: 1, status: 'planned' })
      .expect(200);
    await crew.post(`/api/moves/${move.id}/status`, { version: 2, status: 'loading' }).expect(200);
    await crew.post(`/api/moves/${move.id}/status`, { version: 3, status: 'rolling' }).expect(200);
    await crew.post(`/api/moves/${move.id}/status`, { version: 4, status: 'placed' }).expect(200);
    const counts = (await planner.get('/api/ledger/counts?on=2027-01-23').expect(200)).body.items;
    const at = (id: string) =>
      counts
        .filter((c: { placeId: string }) => c.placeId === id)
        .reduce((s: number, c: { colonies: number }) => s + c.colonies, 0);
    expect(at(yard)).toBe(70);
    expect(at(destination)).toBe(30);
    const entries = await t.db.query(
      `SELECT kind, colonies FROM ledger_entries WHERE move_id = $1`,
      [move.id],
    );
    expect(entries).toEqual([{ kind: 'move', colonies: 30 }]);
  });

  it('when the crew recorded left-behind and lost colonies then placing writes exactly those to the ledger', async () => {
    const second = await createYard(t.db, operationId, 'Second destination');
    const { body: move } = await planner
      .post('/api/moves', {
        name: 'Counted haul',
        nightOf: '2027-01-23',
        destinationKind: 'yard',
        destinationIds: [destination, second],
        origins: [{ yardId: yard, lotId: lot, colonies: 20 }],
      })
      .expect(201);
    await planner
      .post(`/api/moves/${move.id}/status`, { version: 1, status: 'planned' })
      .expect(200);
    const before = (await planner.get('/api/ledger/counts?on=2027-01-24').expect(200)).body.items;
    const countIn = (items: Array<{ placeId: string; colonies: number }>, id: string) =>
      items.filter((c) => c.placeId === id).reduce((s, c) => s + c.colonies, 0);
    // Record on a load: 2 left behind, 1 lost, the rest placed 12 : 5 over the two destinations.
    const [truck] = await t.db.query(
      `INSERT INTO trucks (operation_id, name, payload_kg, pallet_spots, tiers, tare_kg, legal_gross_kg) VALUES ($1, 'Counted rig', 21000, 24, 2, 15000, 36287) RETURNING id`,
      [operationId],
    );
    await t.db.query(
      `INSERT INTO move_loads (operation_id, move_id, truck_id, colonies_planned, colonies_left_behind, colonies_lost, placements)
       VALUES ($1, $2, $3, 20, 2, 1, $4)`,
      [
        operationId,
        move.id,
        truck.id,
        JSON.stringify([
          { placeId: destination, colonies: 12 },
          { placeId: second, colonies: 5 },
        ]),
      ],
    );
    await planner
      .post(`/api/moves/${move.id}/status`, { version: 2, status: 'loading' })
      .expect(200);
    await planner
      .post(`/api/moves/${move.id}/status`, { version: 3, status: 'rolling' })
      .expect(200);
    await planner
      .post(`/api/moves/${move.id}/status`, { version: 4, status: 'placed' })
      .expect(200);
    const after = (await planner.get('/api/ledger/counts?on=2027-01-24').expect(200)).body.items;
    expect(countIn(after, yard) - countIn(before, yard)).toBe(-18); // 2 stayed behind
    expect(countIn(after, destination) - countIn(before, destination)).toBe(12);
    expect(countIn(after, second) - countIn(before, second)).toBe(5);
    const entries = await t.db.query(
      `SELECT kind, colonies FROM ledger_entries WHERE move_id = $1 ORDER BY kind, colonies`,
      [move.id],
    );
    expect(entries).toEqual([
      { kind: 'loss', colonies: 1 },
      { kind: 'move', colonies: 5 },
      { kind: 'move', colonies: 12 },
    ]);
  });

  it('when placing fails part-way then nothing of it is written', async () => {
    const move = await draft(10, '2027-01-24');
    await planner
      .post(`/api/moves/${move.id}/status`, { version: 1, status: 'planned' })
      .expect(200);
    await crew.post(`/api/moves/${move.id}/status`, { version: 2, status: 'loading' }).expect(200);
    await crew.post(`/api/moves/${move.id}/status`, { version: 3, status: 'rolling' }).expect(200);
    // Behind the app's back, the colonies vanish: placing must fail and leave no half-written move.
    await t.db.query(
      `INSERT INTO ledger_entries (operation_id, lot_id, kind, occurred_on, colonies, from_kind, from_id, reason) VALUES ($1, $2, 'loss', '2027-01-23', 70, 'yard', $3, 'flood')`,
      [operationId, lot, yard],
    );
    await crew.post(`/api/moves/${move.id}/status`, { version: 4, status: 'placed' }).expect(409);
    const [{ status }] = await t.db.query(`SELECT status FROM moves WHERE id = $1`, [move.id]);
    expect(status).toBe('rolling');
    expect(
      await t.db.query(`SELECT 1 FROM ledger_entries WHERE move_id = $1`, [move.id]),
    ).toHaveLength(0);
  });

  it('when crew try to plan a move then 403; when a status skips ahead then 409', async () => {
    const move = await draft(1, '2027-02-01');
    await crew.post(`/api/moves/${move.id}/status`, { version: 1, status: 'planned' }).expect(403);
    await planner
      .post(`/api/moves/${move.id}/status`, { version: 1, status: 'placed' })
      .expect(409);
  });

  it('when editing a move at a stale version then 409', async () => {
    const move = await draft(1, '2027-02-02');
    await planner.patch(`/api/moves/${move.id}`, { version: 1, notes: 'first' }).expect(200);
    await planner.patch(`/api/moves/${move.id}`, { version: 1, notes: 'second' }).expect(409);
  });
});

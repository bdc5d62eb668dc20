import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInClient, startTestApp, type Client, type TestApp } from '../../../support/test-app';
import { createCrew, createLot, createYard, testPassword } from '../../../support/factories';

let t: TestApp;
let planner: Client;
let operationId: string;
let lot: string;
let home: string;
let away: string;

beforeAll(async () => {
  t = await startTestApp();
  const people = await createCrew(t.db);
  operationId = people.operationId;
  planner = await signedInClient(t.app, people.planner.email, testPassword);
  lot = await createLot(t.db, operationId);
  home = await createYard(t.db, operationId, 'Home');
  away = await createYard(t.db, operationId, 'Away');
});
afterAll(() => t.close());

const entry = (body: object) =>
  planner.post('/api/ledger', { lotId: lot, reason: 'test', ...body });
const countAt = async (yard: string, on: string) => {
  const { body } = await planner
    .get(`/api/ledger/counts?on=${on}&placeKind=yard&placeId=${yard}`)
    .expect(200);
  return body.items.reduce((sum: number, c: { colonies: number }) => sum + c.colonies, 0);
};

describe('/api/ledger', () => {
  it('when entries are recorded then the count at a place on a date is the sum of entries up to that date', async () => {
    await entry({
      kind: 'purchase',
      occurredOn: '2026-03-01',
      colonies: 120,
      to: { kind: 'yard', id: home },
    }).expect(201);
    await entry({
      kind: 'split',
      occurredOn: '2026-04-01',
      colonies: 30,
      to: { kind: 'yard', id: home },
    }).expect(201);
    await entry({
      kind: 'loss',
      occurredOn: '2026-05-01',
      colonies: 7,
      from: { kind: 'yard', id: home },
      reason: 'dead-outs after a cold snap',
    }).expect(201);
    await entry({
      kind: 'correction',
      occurredOn: '2026-05-02',
      colonies: 2,
      from: { kind: 'yard', id: home },
      reason: 'recount',
    }).expect(201);
    expect(await countAt(home, '2026-02-28')).toBe(0);
    expect(await countAt(home, '2026-03-01')).toBe(120);
    expect(await countAt(home, '2026-04-15')).toBe(150);
    expect(await countAt(home, '2026-06-01')).toBe(141);
  });

  it('when colonies move then they leave one place and arrive at the other: the total is unchanged', async () => {
    const total = async (on: string) => (await countAt(home, on)) + (await countAt(away, on));
    const before = await total('2026-07-01');
    await entry({
      kind: 'move',
      occurredOn: '2026-07-01',
      colonies: 40,
      from: { kind: 'yard', id: home },
      to: { kind: 'yard', id: away },
    }).expect(201);
    expect(await countAt(away, '2026-07-01')).toBe(40);
    expect(await total('2026-07-01')).toBe(before);
  });

  it('when more colonies would leave than are there then 409 and nothing is written', async () => {
    const [{ n }] = await t.db.query(
      `SELECT count(*)::int AS n FROM ledger_entries WHERE operation_id = $1`,
      [operationId],
    );
    const response = await entry({
      kind: 'loss',
      occurredOn: '2026-07-02',
      colonies: 500,
      from: { kind: 'yard', id: away },
    }).expect(409);
    expect(response.body.error.details.available).toBe(40);
    const [after] = await t.db.query(
      `SELECT count(*)::int AS n FROM ledger_entries WHERE operation_id = $1`,
      [operationId],
    );
    expect(after.n).toBe(n);
  });

  it('when an earlier entry would make a later count negative then 409', async () => {
    // 40 are at Away from 07-01; moving 40 out on 07-10 then trying to lose 1 on 07-05 would leave -1 on 07-10.
    await entry({
      kind: 'move',
      occurredOn: '2026-07-10',
      colonies: 40,
      from: { kind: 'yard', id: away },
      to: { kind: 'yard', id: home },
    }).expect(201);
    await entry({
      kind: 'loss',
      occurredOn: '2026-07-05',
      colonies: 1,
      from: { kind: 'yard', id: away },
    }).expect(409);
  });

  it('when an entry lacks its places or reason then 400 names the fields', async () => {
    const response = await planner
      .post('/api/ledger', {
        lotId: lot,
        kind: 'move',
        occurredOn: '2026-07-01',
        colonies: 3,
        to: { kind: 'yard', id: away },
        reason: '',
      })
      .expect(400);
    expect(response.body.error.details.map((d: { field: string }) => d.field)).toEqual(
      expect.arrayContaining(['reason']),
    );
    const twoSided = await planner
      .post('/api/ledger', {
        lotId: lot,
        kind: 'loss',
        occurredOn: '2026-07-01',
        colonies: 3,
        from: { kind: 'yard', id: away },
        to: { kind: 'yard', id: home },
        reason: 'x',
      })
      .expect(400);
    expect(twoSided.body.error.details.map((d: { field: string }) => d.field)).toEqual(['to']);
  });

  it('when ten losses race for the last colonies then the count never goes below zero', async () => {
    const yard = await createYard(t.db, operationId, 'Race');
    await entry({
      kind: 'purchase',
      occurredOn: '2026-08-01',
      colonies: 5,
      to: { kind: 'yard', id: yard },
    }).expect(201);
    const results = await Promise.all(
      Array.from({ length: 10 }, () =>
        entry({
          kind: 'loss',
          occurredOn: '2026-08-02',
          colonies: 1,
          from: { kind: 'yard', id: yard },
        }),
      ),
    );
    expect(results.filter((r) => r.status === 201)).toHaveLength(5);
    expect(results.filter((r) => r.status === 409)).toHaveLength(5);
    expect(await countAt(yard, '2026-08-03')).toBe(0);
  });

  it('when listing entries for a place then both directions are included, newest first', async () => {
    const { body } = await planner.get(`/api/ledger?placeId=${away}`).expect(200);
    expect(body.items.map((e: { occurredOn: string }) => e.occurredOn)).toEqual([
      '2026-07-10',
      '2026-07-01',
    ]);
  });
  it('when entries are added, changed or removed then the running balances equal the ledger summed afresh', async () => {
    const balancesMatchLedger = async () => {
      const [row] = await t.db.query(
        `SELECT
           (SELECT COALESCE(json_agg(b ORDER BY b.place_id, b.lot_id), '[]') FROM
              (SELECT place_id, lot_id, colonies FROM colony_balances
                WHERE operation_id = $1 AND colonies <> 0) b) AS balances,
           (SELECT COALESCE(json_agg(f ORDER BY f.place_id, f.lot_id), '[]') FROM
              (SELECT place_id, lot_id, SUM(delta)::int AS colonies FROM ledger_flows
                WHERE operation_id = $1 GROUP BY place_id, lot_id HAVING SUM(delta) <> 0) f) AS summed`,
        [operationId],
      );
      expect(row.balances).toEqual(row.summed);
      return row.summed as unknown[];
    };
    expect((await balancesMatchLedger()).length).toBeGreaterThan(0);
    // Dated after today: counted from its date on, not before.
    await entry({
      kind: 'purchase',
      occurredOn: '2099-01-01',
      colonies: 5,
      to: { kind: 'yard', id: away },
    }).expect(201);
    const before = await countAt(away, '2098-12-31');
    expect(await countAt(away, '2099-01-01')).toBe(before + 5);
    await balancesMatchLedger();
    // The app never edits or deletes entries; the balances follow if someone does by hand.
    await t.db.query(
      `UPDATE ledger_entries SET colonies = colonies + 1 WHERE operation_id = $1 AND occurred_on = '2099-01-01'`,
      [operationId],
    );
    await balancesMatchLedger();
    await t.db.query(
      `DELETE FROM ledger_entries WHERE operation_id = $1 AND occurred_on = '2099-01-01'`,
      [operationId],
    );
    await balancesMatchLedger();
    expect(await countAt(away, '2099-01-01')).toBe(before);
  });
});

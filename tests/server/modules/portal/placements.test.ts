import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInClient, startTestApp, type TestApp } from '../../../support/test-app';
import { createCrew, createLot, testPassword } from '../../../support/factories';

let t: TestApp;
let people: Awaited<ReturnType<typeof createCrew>>;
let siteA: string;

beforeAll(async () => {
  t = await startTestApp();
  people = await createCrew(t.db);
  const op = people.operationId;
  [{ id: siteA }] = await t.db.query(
    `INSERT INTO sites (operation_id, grower_id, name, kind, crop, latitude, longitude, access_notes) VALUES ($1, $2, 'A block', 'orchard', 'almond', 36.6, -120.3, 'gate 9911') RETURNING id`,
    [op, people.growerA],
  );
  await t.db.query(
    `INSERT INTO contracts (operation_id, grower_id, site_ids, crop, season, status, colonies_ordered, min_frames, fee_per_colony_cents, delivery_start_on, delivery_end_on)
     VALUES ($1, $2, ARRAY[$3]::uuid[], 'almond', 2026, 'in-bloom', 40, 6, 19000, '2026-02-10', '2026-02-12')`,
    [op, people.growerA, siteA],
  );
  const lot = await createLot(t.db, op);
  await t.db.query(
    `INSERT INTO ledger_entries (operation_id, lot_id, kind, occurred_on, colonies, to_kind, to_id, reason) VALUES ($1, $2, 'purchase', '2026-02-11', 40, 'site', $3, 'placed')`,
    [op, lot, siteA],
  );
  await t.db.query(
    `INSERT INTO strength_samples (operation_id, place_kind, place_id, sampled_on, frames, notes) VALUES ($1, 'site', $2, '2026-02-14', ARRAY[9, 8, 5, 7]::double precision[], 'internal: weak corner')`,
    [op, siteA],
  );
});
afterAll(() => t.close());

describe('GET /api/portal/placements', () => {
  it("when grower A asks then their block's colonies and strength checks come back, without the operation's notes", async () => {
    const grower = await signedInClient(t.app, people.growerUserA.email, testPassword);
    const { body } = await grower.get('/api/portal/placements').expect(200);
    expect(body.items).toEqual([
      {
        siteId: siteA,
        siteName: 'A block',
        coloniesToday: 40,
        // 4 colonies inspected, mean (9 + 8 + 5 + 7) / 4 = 7.25; three at or above the 6-frame minimum.
        strengthChecks: [
          {
            sampledOn: '2026-02-14',
            coloniesInspected: 4,
            meanFrames: 7.25,
            minimumFrames: 6,
            atOrAboveMinimum: 3,
          },
        ],
      },
    ]);
    expect(JSON.stringify(body)).not.toMatch(/weak corner|gate 9911/);
  });

  it("when grower B asks then none of grower A's blocks appear", async () => {
    const grower = await signedInClient(t.app, people.growerUserB.email, testPassword);
    const { body } = await grower.get('/api/portal/placements').expect(200);
    expect(body.items).toEqual([]);
  });
});

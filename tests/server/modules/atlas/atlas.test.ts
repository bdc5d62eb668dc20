import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AtlasSummary } from '@shared/schemas/atlas';
import {
  anonymousClient,
  signedInClient,
  type Client,
  type TestApp,
} from '../../../support/test-app';
import {
  buyColonies,
  createCrew,
  createLot,
  createOperation,
  createUser,
  createYard,
  testPassword,
} from '../../../support/factories';
import { startAtlasTestApp } from './atlas-test-app';

let t: TestApp;
let owner: Client;
let planner: Client;
let crew: Client;
let grower: Client;
let stranger: Client;
const ids = {} as Record<'yard' | 'nearYard' | 'site' | 'bareSite' | 'contract' | 'move', string>;

// A block of about 40 ha west of Fresno (a square 0.0072° of latitude a side ≈ 800 m).
const block = {
  type: 'Polygon',
  coordinates: [
    [
      [-120.3, 36.6],
      [-120.291, 36.6],
      [-120.291, 36.6072],
      [-120.3, 36.6072],
      [-120.3, 36.6],
    ],
  ],
};

beforeAll(async () => {
  t = await startAtlasTestApp();
  const people = await createCrew(t.db);
  const op = people.operationId;
  const one = async (sql: string, params: unknown[]) =>
    (await t.db.query(sql, params))[0].id as string;
  ids.yard = await createYard(t.db, op, 'Caliche holding');
  ids.nearYard = await one(
    `INSERT INTO yards (operation_id, name, latitude, longitude, capacity) VALUES ($1, 'Canal bank', 36.62, -120.28, 200) RETURNING id`,
    [op],
  );
  ids.site = await one(
    `INSERT INTO sites (operation_id, grower_id, name, kind, crop, boundary, latitude, longitude, area_ha, drops)
     VALUES ($1, $2, 'North almond block', 'orchard', 'almond', $3, 36.6036, -120.2955, 64.4,
             '{"type":"FeatureCollection","features":[{"type":"Feature","geometry":{"type":"Point","coordinates":[-120.296,36.603]},"properties":{"drop":1,"pallets":4,"colonies":16}}]}')
     RETURNING id`,
    [op, people.growerA, JSON.stringify(block)],
  );
  ids.bareSite = await one(
    `INSERT INTO sites (operation_id, name, kind, crop, latitude, longitude) VALUES ($1, 'Sage flat', 'honey', 'honey', 36.9, -119.9) RETURNING id`,
    [op],
  );
  ids.contract = await one(
    `INSERT INTO contracts (operation_id, grower_id, site_ids, crop, season, status, colonies_ordered, min_frames, fee_per_colony_cents, delivery_start_on, delivery_end_on, removal_on)
     VALUES ($1, $2, ARRAY[$3]::uuid[], 'almond', 2027, 'agreed', 200, 6, 19000, '2027-02-01', '2027-02-10', '2027-03-10') RETURNING id`,
    [op, people.growerA, ids.site],
  );
  // An older, withdrawn contract on the same block must not win.
  await one(
    `INSERT INTO contracts (operation_id, grower_id, site_ids, crop, season, status, colonies_ordered, min_frames, fee_per_colony_cents, delivery_start_on, delivery_end_on)
     VALUES ($1, $2, ARRAY[$3]::uuid[], 'almond', 2027, 'withdrawn', 50, 6, 15000, '2027-02-01', '2027-02-10') RETURNING id`,
    [op, people.growerA, ids.site],
  );
  const lot = await createLot(t.db, op);
  await buyColonies(t.db, op, lot, ids.yard, 300, '2027-01-01');
  await t.db.query(
    `INSERT INTO ledger_entries (operation_id, lot_id, kind, occurred_on, colonies, from_kind, from_id, to_kind, to_id, reason)
     VALUES ($1, $2, 'move', '2027-02-03', 200, 'yard', $3, 'site', $4, 'into the almonds')`,
    [op, lot, ids.yard, ids.site],
  );
  ids.move = await one(
    `INSERT INTO moves (operation_id, name, night_of, status, destination_kind, destination_ids) VALUES ($1, 'Almonds first load', '2027-02-03', 'planned', 'site', ARRAY[$2]::uuid[]) RETURNING id`,
    [op, ids.site],
  );
  await t.db.query(
    `INSERT INTO move_origins (operation_id, move_id, yard_id, lot_id, colonies) VALUES ($1, $2, $3, $4, 200)`,
    [op, ids.move, ids.yard, lot],
  );
  await t.db.query(
    `INSERT INTO spray_notices (operation_id, grower_id, site_id, starts_at, ends_at, product) VALUES ($1, $2, $3, '2027-02-06T14:00:00Z', '2027-02-06T18:00:00Z', 'Fungicide (iprodione)')`,
    [op, people.growerA, ids.site],
  );
  owner = await signedInClient(t.app, people.owner.email, testPassword);
  planner = await signedInClient(t.app, people.planner.email, testPassword);
  crew = await signedInClient(t.app, people.crew.email, testPassword);
  grower = await signedInClient(t.app, people.growerUserA.email, testPassword);
  const other = await createUser(t.db, await createOperation(t.db, 'Other outfit'), 'owner');
  stranger = await signedInClient(t.app, other.email, testPassword);
});
afterAll(() => t.close());

const yardOf = (a: AtlasSummary, id: string) =>
  a.yards.features.find((f) => f.properties.id === id)!;
const siteOf = (a: AtlasSummary, id: string) =>
  a.sites.features.find((f) => f.properties.id === id)!;

describe('GET /api/atlas', () => {
  it('when the date is before the move then the colonies are in the yard and the move is upcoming', async () => {
    const { body } = await planner.get('/api/atlas?on=2027-01-28').expect(200);
    const atlas = body as AtlasSummary;
    expect(atlas.on).toBe('2027-01-28');
    expect(yardOf(atlas, ids.yard).properties).toMatchObject({
      colonies: 300,
      name: 'Caliche holding',
    });
    expect(yardOf(atlas, ids.yard).geometry.coordinates).toEqual([-97.9, 28.1]);
    expect(yardOf(atlas, ids.yard).properties.nextMove).toMatchObject({
      id: ids.move,
      direction: 'out',
    });
    expect(siteOf(atlas, ids.site).properties).toMatchObject({
      colonies: 0,
      contractState: 'agreed',
      growerName: 'Grower A',
      hasBoundary: true,
      dropCount: 1,
    });
    expect(siteOf(atlas, ids.site).properties.nextMove).toMatchObject({ direction: 'in' });
    expect(siteOf(atlas, ids.site).geometry.type).toBe('Polygon');
    expect(atlas.moves.features).toHaveLength(1);
    expect(atlas.moves.features[0].properties).toMatchObject({
      id: ids.move,
      status: 'planned',
      colonies: 200,
      timing: 'upcoming',
    });
    expect(atlas.moves.features[0].geometry).toEqual({
      type: 'LineString',
      coordinates: [
        [-97.9, 28.1],
        [-120.2955, 36.6036],
      ],
    });
    expect(atlas.drops.features[0].properties).toMatchObject({
      siteId: ids.site,
      drop: 1,
      colonies: 16,
    });
  });

  it('when the date is after the move then the ledger puts 200 colonies on the block', async () => {
    const atlas = (await planner.get('/api/atlas?on=2027-02-05').expect(200)).body as AtlasSummary;
    expect(yardOf(atlas, ids.yard).properties.colonies).toBe(100);
    expect(siteOf(atlas, ids.site).properties.colonies).toBe(200);
    expect(siteOf(atlas, ids.site).properties.lots[0]).toMatchObject({ colonies: 200 });
    expect(atlas.totalColonies).toBe(300);
    expect(atlas.moves.features[0].properties.timing).toBe('past');
  });

  it('when a grower has filed a spray for the day then the notice lists the yards within reach', async () => {
    const atlas = (await planner.get('/api/atlas?on=2027-02-06').expect(200)).body as AtlasSummary;
    expect(atlas.sprayNotices.features).toHaveLength(1);
    const notice = atlas.sprayNotices.features[0].properties;
    expect(notice).toMatchObject({
      siteId: ids.site,
      product: 'Fungicide (iprodione)',
      reachKm: 6,
    });
    expect(notice.yardsInReach.map((y) => y.id)).toEqual([ids.nearYard]);
    expect(notice.yardsInReach[0].distanceKm).toBeLessThan(6);
    const narrower = (await planner.get('/api/atlas?on=2027-02-06&reachKm=1').expect(200))
      .body as AtlasSummary;
    expect(narrower.sprayNotices.features[0].properties.yardsInReach).toEqual([]);
    const dayBefore = (await planner.get('/api/atlas?on=2027-02-04').expect(200)).body;
    expect(dayBefore.sprayNotices.features).toHaveLength(1); // shown from two days ahead
    const later = (await planner.get('/api/atlas?on=2027-02-08').expect(200)).body;
    expect(later.sprayNotices.features).toHaveLength(0);
  });

  it('when the owner looks then the fee shows; when the crew looks then it does not', async () => {
    const ownerView = (await owner.get('/api/atlas?on=2027-02-05').expect(200))
      .body as AtlasSummary;
    expect(siteOf(ownerView, ids.site).properties.contract).toMatchObject({
      id: ids.contract,
      feePerColonyCents: 19000,
    });
    const crewView = (await crew.get('/api/atlas?on=2027-02-05').expect(200)).body as AtlasSummary;
    expect(siteOf(crewView, ids.site).properties.contract?.id).toBe(ids.contract);
    expect(JSON.stringify(crewView)).not.toContain('feePerColonyCents');
  });

  it('when a site has no boundary then it is a point with no contract', async () => {
    const atlas = (await planner.get('/api/atlas?on=2027-02-05').expect(200)).body as AtlasSummary;
    expect(siteOf(atlas, ids.bareSite).geometry).toEqual({
      type: 'Point',
      coordinates: [-119.9, 36.9],
    });
    expect(siteOf(atlas, ids.bareSite).properties).toMatchObject({
      contractState: 'none',
      contract: null,
    });
    expect(atlas.growers.find((g) => g.name === 'Grower A')?.siteIds).toEqual([ids.site]);
  });

  it('when another operation looks then it sees none of these records', async () => {
    const atlas = (await stranger.get('/api/atlas?on=2027-02-05').expect(200)).body as AtlasSummary;
    const text = JSON.stringify(atlas);
    for (const id of Object.values(ids)) expect(text).not.toContain(id);
  });

  it('when a grower or a stranger asks then 403 and 401', async () => {
    expect((await grower.get('/api/atlas').expect(403)).body.error.code).toBe('forbidden');
    const anonymous = await anonymousClient(t.app);
    expect((await anonymous.get('/api/atlas').expect(401)).body.error.code).toBe('unauthenticated');
  });

  it('when the date is not a date then 400 names it', async () => {
    const res = await planner.get('/api/atlas?on=2027-02-30').expect(400);
    expect(res.body.error.details[0].field).toBe('on');
  });
});

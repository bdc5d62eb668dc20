import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInClient, startTestApp, type Client, type TestApp } from '../../support/test-app';
import {
  buyColonies,
  createCrew,
  createHiveSetup,
  createLot,
  createYard,
  testPassword,
} from '../../support/factories';

/** Create → read → update → stale update (409) → archive, and a bad create (400, nothing written), for each resource. */
interface Case {
  resource: string;
  table: string;
  create: () => object;
  update: object;
  bad: { body: () => object; fields: string[] };
}

let t: TestApp;
let owner: Client;
let ids: {
  growerId: string;
  hiveSetupId: string;
  lotId: string;
  yardId: string;
  otherYardId: string;
  truckId: string;
};
let operationId: string;

beforeAll(async () => {
  t = await startTestApp();
  const people = await createCrew(t.db);
  operationId = people.operationId;
  owner = await signedInClient(t.app, people.owner.email, testPassword);
  const hiveSetupId = await createHiveSetup(t.db, operationId);
  const lotId = await createLot(t.db, operationId, hiveSetupId);
  const yardId = await createYard(t.db, operationId);
  await buyColonies(t.db, operationId, lotId, yardId, 200);
  const truck = await owner
    .post('/api/trucks', {
      name: 'Rig 1',
      payloadKg: 21000,
      palletSpots: 24,
      tiers: 2,
      tareKg: 15000,
    })
    .expect(201);
  ids = {
    growerId: people.growerA,
    hiveSetupId,
    lotId,
    yardId,
    otherYardId: await createYard(t.db, operationId, 'Other'),
    truckId: truck.body.id,
  };
});
afterAll(() => t.close());

const square = {
  type: 'Polygon',
  coordinates: [
    [
      [-120.3, 36.6],
      [-120.29, 36.6],
      [-120.29, 36.61],
      [-120.3, 36.61],
      [-120.3, 36.6],
    ],
  ],
};
const bowtie = {
  type: 'Polygon',
  coordinates: [
    [
      [-120.3, 36.6],
      [-120.29, 36.61],
      [-120.29, 36.6],
      [-120.3, 36.61],
      [-120.3, 36.6],
    ],
  ],
};

const cases = (): Case[] => [
  {
    resource: 'sites',
    table: 'sites',
    create: () => ({
      name: 'North block',
      kind: 'orchard',
      crop: 'almond',
      growerId: ids.growerId,
      boundary: square,
      bloomStartOn: '2027-02-10',
      bloomEndOn: '2027-03-10',
    }),
    update: { notes: 'sandy loam' },
    bad: {
      body: () => ({
        name: 'Bow tie',
        kind: 'orchard',
        crop: 'almond',
        boundary: bowtie,
        bloomStartOn: '2027-02-30',
      }),
      fields: ['boundary', 'bloomStartOn'],
    },
  },
  {
    resource: 'growers',
    table: 'growers',
    create: () => ({
      name: 'Valley Floor Orchards',
      contacts: [{ name: 'Dana', email: 'dana@example.test', phone: '555-0100' }],
    }),
    update: { billingAddress: 'PO Box 1' },
    bad: {
      body: () => ({ name: '', contacts: [{ name: 'X', email: 'not-an-email' }] }),
      fields: ['name', 'contacts.0.email'],
    },
  },
  {
    resource: 'contracts',
    table: 'contracts',
    create: () => ({
      growerId: ids.growerId,
      crop: 'almond',
      season: 2027,
      coloniesOrdered: 400,
      minFrames: 6,
      averageFrames: 8,
      feePerColonyCents: 19400,
      depositCents: 1940000,
      deliveryStartOn: '2027-02-05',
      deliveryEndOn: '2027-02-12',
      removalOn: '2027-03-15',
    }),
    update: { status: 'offered' },
    bad: {
      body: () => ({
        growerId: ids.growerId,
        crop: 'turnips',
        season: 2027,
        coloniesOrdered: 0,
        minFrames: 6,
        feePerColonyCents: 1.5,
        deliveryStartOn: '2027-02-12',
        deliveryEndOn: '2027-02-05',
      }),
      fields: ['crop', 'coloniesOrdered', 'feePerColonyCents'],
    },
  },
  {
    resource: 'trucks',
    table: 'trucks',
    create: () => ({ name: 'Rig 2', payloadKg: 22000, palletSpots: 26, tiers: 2, tareKg: 14500 }),
    update: { tiers: 1 },
    bad: {
      body: () => ({ name: 'Rig 0', payloadKg: 0, palletSpots: 24, tiers: 0, tareKg: 'heavy' }),
      fields: ['payloadKg', 'tiers', 'tareKg'],
    },
  },
  {
    resource: 'hive-setups',
    table: 'hive_setups',
    create: () => ({
      name: 'Deep and shallow',
      boxes: [
        { size: 'deep', honeyFill: 0.6 },
        { size: 'shallow', honeyFill: 1 },
      ],
    }),
    update: { name: 'Deep + shallow' },
    bad: {
      body: () => ({ name: 'Odd', boxes: [{ size: 'jumbo', honeyFill: 1.5 }] }),
      fields: ['boxes.0.size', 'boxes.0.honeyFill'],
    },
  },
  {
    resource: 'colony-lots',
    table: 'colony_lots',
    create: () => ({
      name: 'Fall splits',
      hiveSetupId: ids.hiveSetupId,
      coloniesPerPallet: 4,
      meanFrames: 7,
    }),
    update: { coloniesPerPallet: 6 },
    bad: {
      body: () => ({
        name: 'Nowhere',
        hiveSetupId: '00000000-0000-4000-8000-000000000000',
        coloniesPerPallet: 4,
      }),
      fields: ['hiveSetupId'],
    },
  },
  {
    resource: 'moves',
    table: 'moves',
    create: () => ({
      name: 'First haul',
      nightOf: '2027-01-25',
      destinationKind: 'yard',
      destinationIds: [ids.otherYardId],
      origins: [{ yardId: ids.yardId, lotId: ids.lotId, colonies: 48 }],
      loads: [{ truckId: ids.truckId, driverNames: ['Sam'] }],
    }),
    update: { notes: 'gate at the back' },
    bad: {
      body: () => ({
        name: 'Bad haul',
        nightOf: '2027-13-01',
        destinationKind: 'yard',
        destinationIds: [],
        origins: [],
      }),
      fields: ['nightOf', 'destinationIds', 'origins'],
    },
  },
  {
    resource: 'users',
    table: 'users',
    create: () => ({
      email: `hand-${Date.now()}@example.test`,
      name: 'New hand',
      role: 'crew',
      password: 'long-enough-phrase',
    }),
    update: { role: 'planner' },
    bad: {
      body: () => ({ email: 'no', name: 'X', role: 'boss', password: 'short' }),
      fields: ['email', 'role', 'password'],
    },
  },
];

describe('API resources: create, read, update, archive', () => {
  for (const name of [
    'sites',
    'growers',
    'contracts',
    'trucks',
    'hive-setups',
    'colony-lots',
    'moves',
    'users',
  ]) {
    it(`/api/${name}: when created, read, updated and archived then each answers; a stale version gets 409`, async () => {
      const c = cases().find((x) => x.resource === name)!;
      const created = await owner.post(`/api/${name}`, c.create()).expect(201);
      expect(created.body.version).toBe(1);
      const id = created.body.id;
      await owner.get(`/api/${name}/${id}`).expect(200);
      const list = await owner.get(`/api/${name}`).expect(200);
      expect(list.body.items.map((x: { id: string }) => x.id)).toContain(id);
      expect(typeof list.body.total).toBe('number');
      const updated = await owner
        .patch(`/api/${name}/${id}`, { version: 1, ...c.update })
        .expect(200);
      expect(updated.body).toMatchObject({ ...c.update, version: 2 });
      const stale = await owner
        .patch(`/api/${name}/${id}`, { version: 1, ...c.update })
        .expect(409);
      expect(stale.body.error.code).toBe('version_conflict');
      const archived = await owner.post(`/api/${name}/${id}/archive`, { version: 2 }).expect(200);
      if (name === 'users') expect(archived.body.active).toBe(false);
      else expect(archived.body.archivedAt).not.toBeNull();
    });

    it(`/api/${name}: when the body is bad then 400 names each field and nothing is written`, async () => {
      const c = cases().find((x) => x.resource === name)!;
      const [before] = await t.db.query(
        `SELECT count(*)::int AS n FROM ${c.table} WHERE operation_id = $1`,
        [operationId],
      );
      const response = await owner.post(`/api/${name}`, c.bad.body()).expect(400);
      const fields = response.body.error.details.map((d: { field: string }) => d.field);
      expect(fields).toEqual(expect.arrayContaining(c.bad.fields));
      const [after] = await t.db.query(
        `SELECT count(*)::int AS n FROM ${c.table} WHERE operation_id = $1`,
        [operationId],
      );
      expect(after.n).toBe(before.n);
    });
  }

  it('when a site has a boundary then its acreage and point come from it', async () => {
    const created = await owner.post('/api/sites', cases()[0].create()).expect(201);
    // 0.01° × 0.01° at 36.6°N ≈ 1.113 km × 0.893 km ≈ 99.4 ha (spherical estimate, from memory).
    expect(created.body.areaHa).toBeGreaterThan(95);
    expect(created.body.areaHa).toBeLessThan(103);
    expect(created.body.latitude).toBeGreaterThan(36.6);
    expect(created.body.longitude).toBeLessThan(-120.29);
  });

  it('when a grower is updated with contacts then the list replaces the old one in one write', async () => {
    const created = await owner
      .post('/api/growers', { name: 'Two Creeks Ranch', contacts: [{ name: 'A' }, { name: 'B' }] })
      .expect(201);
    const updated = await owner
      .patch(`/api/growers/${created.body.id}`, {
        version: 1,
        contacts: [{ name: 'C', title: 'foreman' }],
      })
      .expect(200);
    expect(updated.body.contacts.map((c: { name: string }) => c.name)).toEqual(['C']);
  });

  it("when a contract's delivery window ends before it starts then 400 names deliveryEndOn", async () => {
    const body = {
      ...(cases()[2].create() as object),
      deliveryStartOn: '2027-02-12',
      deliveryEndOn: '2027-02-05',
    };
    const response = await owner.post('/api/contracts', body).expect(400);
    expect(response.body.error.details.map((d: { field: string }) => d.field)).toEqual([
      'deliveryEndOn',
    ]);
  });

  it('when a yard is given another operation-like unknown id then 404', async () => {
    await owner.get('/api/yards/00000000-0000-4000-8000-000000000000').expect(404);
  });
});

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, signedInClient, type Client, type TestApp } from '../../../support/test-app';
import { buyColonies, createCrew, createLot, testPassword } from '../../../support/factories';

let t: TestApp;
let planner: Client;
let crew: Client;
let operationId: string;

beforeAll(async () => {
  t = await startTestApp();
  const people = await createCrew(t.db);
  operationId = people.operationId;
  planner = await signedInClient(t.app, people.planner.email, testPassword);
  crew = await signedInClient(t.app, people.crew.email, testPassword);
});
afterAll(() => t.close());

const yard = {
  name: 'Caliche Ridge',
  latitude: 28.2,
  longitude: -98.1,
  capacity: 400,
  accessNotes: 'gate 4471',
};

describe('/api/yards', () => {
  it('when a planner creates, reads, updates and archives a yard then each step answers with the record', async () => {
    const created = await planner.post('/api/yards', yard).expect(201);
    expect(created.body).toMatchObject({ ...yard, version: 1, colonies: 0, archivedAt: null });
    const id = created.body.id;
    expect((await planner.get(`/api/yards/${id}`).expect(200)).body.name).toBe('Caliche Ridge');
    const updated = await planner
      .patch(`/api/yards/${id}`, { version: 1, capacity: 450 })
      .expect(200);
    expect(updated.body).toMatchObject({ capacity: 450, version: 2, name: 'Caliche Ridge' });
    const list = await planner.get('/api/yards?q=caliche').expect(200);
    expect(list.body.total).toBe(1);
    await planner.post(`/api/yards/${id}/archive`, { version: 2 }).expect(200);
    expect((await planner.get('/api/yards?q=caliche').expect(200)).body.total).toBe(0);
    expect((await planner.get('/api/yards?q=caliche&archived=true').expect(200)).body.total).toBe(
      1,
    );
  });

  it('when a field is bad then 400 names it and nothing is written', async () => {
    const before = await t.db.query(
      `SELECT count(*)::int AS n FROM yards WHERE operation_id = $1`,
      [operationId],
    );
    const response = await planner
      .post('/api/yards', { ...yard, latitude: 123, capacity: 'many', role: 'owner' })
      .expect(400);
    const fields = response.body.error.details.map((d: { field: string }) => d.field);
    expect(fields).toEqual(expect.arrayContaining(['latitude', 'capacity', 'role']));
    expect(response.body.error.code).toBe('validation_failed');
    const after = await t.db.query(`SELECT count(*)::int AS n FROM yards WHERE operation_id = $1`, [
      operationId,
    ]);
    expect(after[0].n).toBe(before[0].n);
  });

  it('when the version is stale then 409 and the newer edit stays', async () => {
    const { body } = await planner.post('/api/yards', yard).expect(201);
    await planner.patch(`/api/yards/${body.id}`, { version: 1, capacity: 300 }).expect(200);
    const stale = await planner
      .patch(`/api/yards/${body.id}`, { version: 1, capacity: 999 })
      .expect(409);
    expect(stale.body.error.code).toBe('version_conflict');
    expect((await planner.get(`/api/yards/${body.id}`)).body.capacity).toBe(300);
  });

  it('when colonies are bought into a yard then its count comes from the ledger by box setup', async () => {
    const { body } = await planner.post('/api/yards', yard).expect(201);
    const lot = await createLot(t.db, operationId);
    await buyColonies(t.db, operationId, lot, body.id, 96);
    const read = await crew.get(`/api/yards/${body.id}`).expect(200);
    expect(read.body.colonies).toBe(96);
    expect(read.body.coloniesBySetup).toEqual([
      expect.objectContaining({ hiveSetupName: 'Two deeps', colonies: 96 }),
    ]);
  });

  it('when crew try to create a yard then 403', async () => {
    await crew.post('/api/yards', yard).expect(403);
  });

  it('when the id is not a UUID then 400 names id', async () => {
    const response = await planner.get('/api/yards/not-an-id').expect(400);
    expect(response.body.error.details[0].field).toBe('id');
  });
});

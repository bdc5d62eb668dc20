import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInClient, startTestApp, type Client, type TestApp } from '../../../support/test-app';
import { createCrew, createOperation, createUser, testPassword } from '../../../support/factories';

let t: TestApp;
let people: Awaited<ReturnType<typeof createCrew>>;
let planner: Client;
let contractA: string;
let contractB: string;

const contract = (growerId: string) => ({
  growerId,
  crop: 'almond',
  season: 2027,
  coloniesOrdered: 200,
  minFrames: 6,
  averageFrames: 8,
  feePerColonyCents: 19800,
  depositCents: 990000,
  deliveryStartOn: '2027-02-08',
  deliveryEndOn: '2027-02-14',
  internalNotes: 'slow payer, call before delivery',
});

beforeAll(async () => {
  t = await startTestApp();
  people = await createCrew(t.db);
  planner = await signedInClient(t.app, people.planner.email, testPassword);
  contractA = (await planner.post('/api/contracts', contract(people.growerA)).expect(201)).body.id;
  contractB = (await planner.post('/api/contracts', contract(people.growerB)).expect(201)).body.id;
});
afterAll(() => t.close());

describe('/api/contracts field and record access', () => {
  it('when crew read contracts then no fee, deposit or adjustment is in any response', async () => {
    const crew = await signedInClient(t.app, people.crew.email, testPassword);
    const list = await crew.get('/api/contracts').expect(200);
    const one = await crew.get(`/api/contracts/${contractA}`).expect(200);
    const text = JSON.stringify([list.body, one.body]);
    expect(text).not.toMatch(/Cents/);
    expect(text).not.toContain('19800');
  });

  it('when grower A lists contracts then only their own appear, without internal notes', async () => {
    const grower = await signedInClient(t.app, people.growerUserA.email, testPassword);
    const list = await grower.get('/api/contracts').expect(200);
    expect(list.body.items.map((c: { id: string }) => c.id)).toEqual([contractA]);
    expect(JSON.stringify(list.body)).not.toContain('slow payer');
    await grower.get(`/api/contracts/${contractB}`).expect(404);
    const growers = await grower.get('/api/growers').expect(200);
    expect(growers.body.items.map((g: { id: string }) => g.id)).toEqual([people.growerA]);
    expect(JSON.stringify(growers.body)).not.toContain('pays late');
  });

  it("when another operation's owner lists contracts then none of this operation's appear", async () => {
    const other = await createUser(t.db, await createOperation(t.db, 'Elsewhere'), 'owner');
    const client = await signedInClient(t.app, other.email, testPassword);
    const list = await client.get('/api/contracts').expect(200);
    expect(list.body.items.map((c: { id: string }) => c.id)).not.toContain(contractA);
    await client.get(`/api/contracts/${contractA}`).expect(404);
    await client.post('/api/contracts', contract(people.growerA)).expect(400);
  });

  it('when a contract changes status then its history records the step', async () => {
    const { body } = await planner.get(`/api/contracts/${contractA}`).expect(200);
    await planner
      .patch(`/api/contracts/${contractA}`, { version: body.version, status: 'offered' })
      .expect(200);
    const history = await planner.get(`/api/contracts/${contractA}/history`).expect(200);
    expect(history.body.items.map((e: { kind: string }) => e.kind)).toEqual([
      'created',
      'status-changed',
    ]);
    expect(history.body.items[1].detail).toEqual({ from: 'draft', to: 'offered' });
  });

  it('when a request body carries role, operationId or id then it is refused and nothing changes', async () => {
    const { body } = await planner.get(`/api/contracts/${contractA}`).expect(200);
    const response = await planner
      .patch(`/api/contracts/${contractA}`, {
        version: body.version,
        operationId: people.operationId,
        id: contractB,
        role: 'owner',
      })
      .expect(400);
    expect(response.body.error.details.map((d: { field: string }) => d.field).sort()).toEqual([
      'id',
      'operationId',
      'role',
    ]);
    expect((await planner.get(`/api/contracts/${contractA}`)).body.version).toBe(body.version);
  });
});

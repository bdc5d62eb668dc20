import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInClient, startTestApp, type Client, type TestApp } from '../../../support/test-app';
import { createCrew, createYard, testPassword } from '../../../support/factories';

let t: TestApp;
let crew: Client;
let yard: string;

beforeAll(async () => {
  t = await startTestApp();
  const people = await createCrew(t.db);
  crew = await signedInClient(t.app, people.crew.email, testPassword);
  yard = await createYard(t.db, people.operationId);
});
afterAll(() => t.close());

describe('/api/weight-samples and /api/strength-samples', () => {
  it('when crew record scale readings then the answer carries their mean, spread and count', async () => {
    const { body } = await crew
      .post('/api/weight-samples', {
        yardId: yard,
        sampledOn: '2026-11-20',
        weightsKg: [50, 54, 46, 52, 48],
      })
      .expect(201);
    expect(body.summary.samples).toBe(5);
    expect(body.summary.mean).toBeCloseTo(50, 10);
    // Sample sd of 50, 54, 46, 52, 48: sqrt(40 / 4) = 3.1623 (worked by hand).
    expect(body.summary.sd).toBeCloseTo(Math.sqrt(10), 10);
    const list = await crew.get(`/api/weight-samples?yardId=${yard}`).expect(200);
    expect(list.body.items.map((s: { id: string }) => s.id)).toEqual([body.id]);
  });

  it('when crew record a strength inspection then the share at the minimum is reported', async () => {
    const { body } = await crew
      .post('/api/strength-samples', {
        placeKind: 'yard',
        placeId: yard,
        sampledOn: '2026-11-21',
        frames: [9, 8, 5, 10, 7, 6, 4, 8],
      })
      .expect(201);
    // 6 of 8 colonies at or above the 6-frame minimum (almond practice, REFERENCES.md).
    expect(body.summary.atOrAboveMinimum).toBe(6);
    expect(body.summary.meanFrames).toBeCloseTo(57 / 8, 10);
  });

  it('when a single hive is weighed then it is kept without a spread', async () => {
    const { body } = await crew
      .post('/api/weight-samples', { yardId: yard, sampledOn: '2026-11-22', weightsKg: [51] })
      .expect(201);
    expect(body.summary).toBeNull();
    await crew.get(`/api/weight-samples?yardId=${yard}`).expect(200);
  });

  it('when a reading is impossible then 400 names it and nothing is written', async () => {
    const response = await crew
      .post('/api/weight-samples', { yardId: yard, sampledOn: '2026-11-31', weightsKg: [-3] })
      .expect(400);
    expect(response.body.error.details.map((d: { field: string }) => d.field).sort()).toEqual([
      'sampledOn',
      'weightsKg.0',
    ]);
    expect((await crew.get(`/api/weight-samples?yardId=${yard}`)).body.total).toBe(2);
  });
});

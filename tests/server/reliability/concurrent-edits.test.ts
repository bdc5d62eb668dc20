import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInClient, startTestApp, type Client, type TestApp } from '../../support/test-app';
import { createCrew, createYard, testPassword } from '../../support/factories';

let t: TestApp;
let planner: Client;
let operationId: string;

beforeAll(async () => {
  t = await startTestApp();
  const people = await createCrew(t.db);
  operationId = people.operationId;
  planner = await signedInClient(t.app, people.planner.email, testPassword);
});
afterAll(() => t.close());

describe('concurrent edits of one record', () => {
  it('when 20 edits arrive at once at one version then exactly one wins and 19 get 409', async () => {
    const yard = await createYard(t.db, operationId, 'Contested');
    const results = await Promise.all(
      Array.from({ length: 20 }, (_, i) =>
        planner.patch(`/api/yards/${yard}`, { version: 1, capacity: 100 + i }),
      ),
    );
    const statuses = results.map((r) => r.status);
    expect(statuses.filter((s) => s === 200)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(19);
    const winner = results.find((r) => r.status === 200)!;
    const [row] = await t.db.query(`SELECT capacity, version FROM yards WHERE id = $1`, [yard]);
    expect(row).toEqual({ capacity: winner.body.capacity, version: 2 });
  });
});

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  anonymousClient,
  signedInClient,
  startTestApp,
  type Client,
  type TestApp,
} from '../../support/test-app';
import { createOperation, createUser, testPassword } from '../../support/factories';
import {
  bodyFor,
  createWorld,
  freshTarget,
  removeStoredDocuments,
  routeParts,
  routeQueries,
  snapshot,
  withLoad,
  type World,
} from '../../support/route-fixtures';

/**
 * Every API route × every kind of caller, with the status each must get (SECURITY.md). The test
 * fails when the app has a route this table does not list. Denied writes must change nothing.
 */
type Actor =
  'anonymous' | 'owner' | 'planner' | 'crew' | 'growerA' | 'growerB' | 'otherOwner' | 'deactivated';
type Row = [
  anonymous: number,
  owner: number,
  planner: number,
  crew: number,
  growerA: number,
  growerB: number,
  otherOwner: number,
  deactivated: number,
];
const actors: Actor[] = [
  'anonymous',
  'owner',
  'planner',
  'crew',
  'growerA',
  'growerB',
  'otherOwner',
  'deactivated',
];

//                                                anon owner plan crew  grA  grB  other deact
const matrix: Record<string, Row> = {
  'GET /api/health': [200, 200, 200, 200, 200, 200, 200, 200],
  'GET /api/session': [200, 200, 200, 200, 200, 200, 200, 200],
  'POST /api/session': [401, 401, 401, 401, 401, 401, 401, 401], // wrong password for everyone
  'PUT /api/session/preferences': [401, 200, 200, 200, 200, 200, 200, 401],
  'POST /api/session/password': [401, 400, 400, 400, 400, 400, 400, 401], // wrong current password
  'GET /api/yards': [401, 200, 200, 200, 403, 403, 200, 401],
  'GET /api/yards/:id': [401, 200, 200, 200, 403, 403, 404, 401],
  'POST /api/yards': [401, 201, 201, 403, 403, 403, 201, 401],
  'PATCH /api/yards/:id': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/yards/:id/archive': [401, 200, 200, 403, 403, 403, 404, 401],
  'GET /api/sites': [401, 200, 200, 200, 200, 200, 200, 401],
  'GET /api/sites/:id': [401, 200, 200, 200, 200, 404, 404, 401],
  'POST /api/sites': [401, 201, 201, 403, 403, 403, 400, 401], // grower of another operation
  'PATCH /api/sites/:id': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/sites/:id/archive': [401, 200, 200, 403, 403, 403, 404, 401],
  'GET /api/growers': [401, 200, 200, 200, 200, 200, 200, 401],
  'GET /api/growers/:id': [401, 200, 200, 200, 200, 404, 404, 401],
  'POST /api/growers': [401, 201, 201, 403, 403, 403, 201, 401],
  'PATCH /api/growers/:id': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/growers/:id/archive': [401, 200, 200, 403, 403, 403, 404, 401],
  'GET /api/contracts': [401, 200, 200, 200, 200, 200, 200, 401],
  'GET /api/contracts/:id': [401, 200, 200, 200, 200, 404, 404, 401],
  'GET /api/contracts/:id/history': [401, 200, 200, 403, 200, 404, 404, 401],
  'POST /api/contracts': [401, 201, 201, 403, 403, 403, 400, 401],
  'PATCH /api/contracts/:id': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/contracts/:id/archive': [401, 200, 200, 403, 403, 403, 404, 401],
  'GET /api/trucks': [401, 200, 200, 200, 403, 403, 200, 401],
  'GET /api/trucks/:id': [401, 200, 200, 200, 403, 403, 404, 401],
  'POST /api/trucks': [401, 201, 403, 403, 403, 403, 201, 401],
  'PATCH /api/trucks/:id': [401, 200, 403, 403, 403, 403, 404, 401],
  'POST /api/trucks/:id/archive': [401, 200, 403, 403, 403, 403, 404, 401],
  'GET /api/moves': [401, 200, 200, 200, 403, 403, 200, 401],
  'GET /api/moves/:id': [401, 200, 200, 200, 403, 403, 404, 401],
  'POST /api/moves': [401, 201, 201, 403, 403, 403, 400, 401],
  'PATCH /api/moves/:id': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/moves/:id/archive': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/moves/:id/status': [401, 200, 200, 403, 403, 403, 404, 401], // draft → planned: planners only
  'POST /api/moves/preview': [401, 200, 200, 403, 403, 403, 400, 401], // other: not their yard
  'GET /api/moves/availability': [401, 200, 200, 200, 403, 403, 200, 401],
  'POST /api/moves/sync': [401, 200, 200, 200, 403, 403, 200, 401], // other: its change answered 404 inside
  'GET /api/moves/:id/load-sheet': [401, 200, 200, 200, 403, 403, 404, 401],
  'PATCH /api/moves/:id/loads/:loadId': [401, 200, 200, 200, 403, 403, 404, 401],
  'GET /api/calendar-feeds/me': [401, 200, 200, 200, 403, 403, 200, 401],
  'POST /api/calendar-feeds/me/rotate': [401, 200, 200, 200, 403, 403, 200, 401],
  'GET /api/season': [401, 200, 200, 200, 403, 403, 200, 401],
  'GET /api/hive-setups': [401, 200, 200, 200, 403, 403, 200, 401],
  'GET /api/hive-setups/:id': [401, 200, 200, 200, 403, 403, 404, 401],
  'POST /api/hive-setups': [401, 201, 201, 403, 403, 403, 201, 401],
  'PATCH /api/hive-setups/:id': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/hive-setups/:id/archive': [401, 200, 200, 403, 403, 403, 404, 401],
  'GET /api/colony-lots': [401, 200, 200, 200, 403, 403, 200, 401],
  'GET /api/colony-lots/:id': [401, 200, 200, 200, 403, 403, 404, 401],
  'POST /api/colony-lots': [401, 201, 201, 403, 403, 403, 400, 401],
  'PATCH /api/colony-lots/:id': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/colony-lots/:id/archive': [401, 200, 200, 403, 403, 403, 404, 401],
  'GET /api/ledger': [401, 200, 200, 200, 403, 403, 200, 401],
  'GET /api/ledger/counts': [401, 200, 200, 200, 403, 403, 200, 401],
  'GET /api/ledger/:id': [401, 200, 200, 200, 403, 403, 404, 401],
  'POST /api/ledger': [401, 201, 201, 403, 403, 403, 400, 401],
  'GET /api/users': [401, 200, 403, 403, 403, 403, 200, 401],
  'GET /api/users/:id': [401, 200, 403, 403, 403, 403, 404, 401],
  'POST /api/users': [401, 201, 403, 403, 403, 403, 201, 401],
  'PATCH /api/users/:id': [401, 200, 403, 403, 403, 403, 404, 401],
  'POST /api/users/:id/archive': [401, 200, 403, 403, 403, 403, 404, 401],
  'GET /api/weight-samples': [401, 200, 200, 200, 403, 403, 200, 401],
  'POST /api/weight-samples': [401, 201, 201, 201, 403, 403, 400, 401],
  'GET /api/strength-samples': [401, 200, 200, 200, 403, 403, 200, 401],
  'POST /api/strength-samples': [401, 201, 201, 201, 403, 403, 400, 401],
  'POST /api/sites/:id/boundary': [401, 200, 200, 403, 403, 403, 404, 401],
  'PATCH /api/sites/:id/drops': [401, 200, 200, 403, 403, 403, 404, 401],
  'GET /api/atlas': [401, 200, 200, 200, 403, 403, 200, 401],
  'GET /api/portal/placements': [401, 403, 403, 403, 200, 200, 403, 401],
  'GET /api/crops': [401, 200, 200, 200, 403, 403, 200, 401],
  'POST /api/calc/hive-weight': [401, 200, 200, 200, 403, 403, 200, 401],
  'POST /api/calc/load-plan': [401, 200, 200, 200, 403, 403, 200, 401],
  'POST /api/calc/move-window': [401, 200, 200, 200, 403, 403, 200, 401],
  'POST /api/calc/site-plan': [401, 200, 200, 200, 403, 403, 200, 401],
  'POST /api/contracts/:id/proposals': [401, 201, 201, 403, 403, 403, 404, 401],
  'GET /api/proposals': [401, 200, 200, 403, 200, 200, 200, 401],
  'POST /api/proposals/:id/confirm': [401, 403, 403, 403, 200, 404, 403, 401], // growers answer
  'POST /api/proposals/:id/decline': [401, 403, 403, 403, 200, 404, 403, 401],
  'POST /api/proposals/:id/counter': [401, 403, 403, 403, 200, 404, 403, 401],
  'GET /api/notifications': [401, 200, 200, 200, 403, 403, 200, 401],
  'POST /api/notifications/:id/read': [401, 200, 404, 404, 403, 403, 404, 401], // the owner's own
  'GET /api/spray-notices': [401, 200, 200, 200, 200, 200, 200, 401],
  'GET /api/spray-notices/:id': [401, 200, 200, 200, 200, 404, 404, 401],
  'POST /api/spray-notices': [401, 201, 201, 403, 201, 400, 400, 401], // grower A's site
  'POST /api/spray-notices/:id/acknowledge': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/spray-notices/:id/archive': [401, 200, 200, 403, 200, 404, 404, 401],
  'GET /api/documents': [401, 200, 200, 200, 200, 200, 200, 401],
  'GET /api/documents/:id': [401, 200, 200, 404, 200, 404, 404, 401], // a shared contract PDF
  'GET /api/documents/:id/download': [401, 200, 200, 404, 200, 404, 404, 401],
  'POST /api/documents': [401, 415, 415, 403, 403, 403, 415, 401], // JSON, not multipart: see documents.test.ts
  'POST /api/documents/:id/share': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/documents/:id/archive': [401, 200, 200, 403, 403, 403, 404, 401],
  'GET /api/invoices': [401, 200, 200, 403, 200, 200, 200, 401],
  'GET /api/invoices/export.csv': [401, 200, 403, 403, 403, 403, 200, 401],
  'GET /api/invoices/:id': [401, 200, 200, 403, 200, 404, 404, 401],
  'POST /api/invoices': [401, 201, 403, 403, 403, 403, 400, 401], // other: not their contract
  'POST /api/invoices/:id/issue': [401, 200, 403, 403, 403, 403, 404, 401],
  'POST /api/invoices/:id/void': [401, 200, 403, 403, 403, 403, 404, 401],
  'POST /api/invoices/:id/checkout': [401, 409, 403, 403, 409, 404, 404, 401], // a draft: not payable yet
  'GET /api/payments/export.csv': [401, 200, 403, 403, 403, 403, 200, 401],
  'POST /api/payments/webhook': [400, 400, 400, 400, 400, 400, 400, 400], // unsigned: see payments.test.ts
  'GET /api/receivables': [401, 200, 403, 403, 403, 403, 200, 401],
  // Last: signing out ends every client's session.
  'DELETE /api/session': [204, 204, 204, 204, 204, 204, 204, 204],
};

let t: TestApp;
let world: World;
const clients = {} as Record<Actor, Client>;

beforeAll(async () => {
  t = await startTestApp();
  const created = await createWorld(t.db, t.env);
  const people = created.people;
  const other = await createOperation(t.db, 'Another operation');
  const otherOwner = await createUser(t.db, other, 'owner');
  const deactivated = await createUser(t.db, people.operationId, 'planner');
  world = created.world;
  clients.anonymous = await anonymousClient(t.app);
  clients.owner = await signedInClient(t.app, people.owner.email, testPassword);
  clients.planner = await signedInClient(t.app, people.planner.email, testPassword);
  clients.crew = await signedInClient(t.app, people.crew.email, testPassword);
  clients.growerA = await signedInClient(t.app, people.growerUserA.email, testPassword);
  clients.growerB = await signedInClient(t.app, people.growerUserB.email, testPassword);
  clients.otherOwner = await signedInClient(t.app, otherOwner.email, testPassword);
  clients.deactivated = await signedInClient(t.app, deactivated.email, testPassword);
  // Deactivated behind the app's back: the cookie is still live, the account is not.
  await t.db.query(`UPDATE users SET active = false WHERE id = $1`, [deactivated.id]);
}, 60_000);
afterAll(async () => {
  await removeStoredDocuments();
  await t.close();
});

describe('authorization matrix', () => {
  it('when the app lists its routes then every one is in the matrix, and every matrix row is a route', () => {
    const routes: string[] = t.app.locals.apiRoutes;
    expect(routes.filter((r) => !(r in matrix))).toEqual([]);
    expect(Object.keys(matrix).filter((r) => !routes.includes(r))).toEqual([]);
  });

  for (const [route, row] of Object.entries(matrix)) {
    it(`${route}: each caller gets the expected status; denied writes change nothing`, async () => {
      const { method, path, resource, hasId, tail } = routeParts(route);
      // Denied callers first, so allowed writes do not archive the target under them.
      const order = [...actors].sort(
        (a, b) => Number(row[actors.indexOf(a)] < 300) - Number(row[actors.indexOf(b)] < 300),
      );
      for (const actor of order) {
        const expected = row[actors.indexOf(actor)];
        const id = hasId ? await freshTarget(t.db, world, resource, method) : null;
        const url =
          (await withLoad(t.db, world, path.replace(':id', id ?? ''), id)) +
          (routeQueries[route] ?? '');
        const body =
          method === 'GET' || method === 'DELETE'
            ? undefined
            : await bodyFor(t.db, world, method, resource, tail, id);
        const before = method === 'GET' ? '' : await snapshot(t.db, world.operationId);
        const client = clients[actor];
        const response =
          method === 'GET'
            ? await client.get(url)
            : method === 'DELETE'
              ? await client.delete(url)
              : await client[method.toLowerCase() as 'post' | 'patch' | 'put'](url, body);
        expect({
          actor,
          status: response.status,
          body: response.status === expected ? null : response.body,
        }).toEqual({ actor, status: expected, body: null });
        if (expected >= 400) {
          expect(response.body.error?.code, `${actor} gets the error envelope`).toBeTruthy();
          if (method !== 'GET')
            expect(
              await snapshot(t.db, world.operationId),
              `${actor}'s denied ${route} changed nothing`,
            ).toBe(before);
        }
        if (route === 'DELETE /api/session' && actor !== 'anonymous' && actor !== 'deactivated') {
          // Signing out really signed them out.
          const again = await client.get('/api/yards');
          expect(again.status).toBe(401);
        }
      }
    });
  }
});

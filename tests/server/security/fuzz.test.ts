import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type supertest from 'supertest';
import { signedInClient, startTestApp, type Client, type TestApp } from '../../support/test-app';
import { testPassword } from '../../support/factories';
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
 * Every API route, fuzzed from the app's own route table with fast-check: a valid body with one
 * field made hostile, an extra key smuggled in, a malformed id in the path, repeated or hostile
 * query parameters. The owner sends them (the caller with the most rights). Whatever comes back
 * must be below 500, in the error envelope when refused, free of stack traces and SQL, and a
 * refused write must leave every row of the operation as it was.
 */

const hostileValues = fc.constantFrom<unknown>(
  '\u0000',
  'nul\u0000inside',
  'x'.repeat(10_000),
  1e308,
  -1e308,
  -1,
  2 ** 53 + 1,
  0.1,
  '',
  null,
  true,
  [],
  ['a', 'b'],
  {},
  { nested: { deeper: 'x'.repeat(500) } },
  '2027-02-30',
  '00000000-0000-0000-0000-000000000000',
  "'; DROP TABLE yards; --",
  '<script>alert(1)</script>',
  '\u202egnp.exe',
);
const smuggledKeys = fc.constantFrom(
  'role',
  'operationId',
  'version',
  '__proto__',
  'id',
  'constructor',
  'passwordHash',
  'growerId',
);
const badIds = fc.constantFrom(
  'not-a-uuid',
  '..%2F..%2Fetc%2Fpasswd',
  '%00',
  'x'.repeat(300),
  "1'%20OR%20'1'='1",
  '-1',
  '00000000-0000-0000-0000-00000000000g',
);

/** One way to spoil a valid request. */
type Spoil =
  | { kind: 'field'; field: number; value: unknown }
  | { kind: 'extra'; key: string; value: unknown }
  | { kind: 'id'; id: string }
  | { kind: 'array-for-body' };

const spoils = fc.oneof(
  fc.record({ kind: fc.constant('field' as const), field: fc.nat(20), value: hostileValues }),
  fc.record({ kind: fc.constant('extra' as const), key: smuggledKeys, value: hostileValues }),
  fc.record({ kind: fc.constant('id' as const), id: badIds }),
  fc.constant({ kind: 'array-for-body' as const }),
);

/** The body as JSON text with the spoil applied (text, so `__proto__` stays a plain key). */
function spoiledJson(body: Record<string, unknown>, spoil: Spoil): string {
  if (spoil.kind === 'array-for-body') return JSON.stringify([body]);
  if (spoil.kind === 'field') {
    const keys = Object.keys(body);
    if (keys.length === 0) return JSON.stringify({ unexpected: spoil.value });
    return JSON.stringify({ ...body, [keys[spoil.field % keys.length]]: spoil.value });
  }
  if (spoil.kind === 'extra') {
    const inner = JSON.stringify(body).slice(1, -1);
    const extra = `${JSON.stringify(spoil.key)}:${JSON.stringify(spoil.value)}`;
    return `{${inner}${inner ? ',' : ''}${extra}}`;
  }
  return JSON.stringify(body);
}

/** Stack frames, file paths or SQL in an answer mean something leaked. */
const leak =
  /\bat [\w.<>]+ \(|node_modules|\.ts:\d+|\bSELECT\b|\bINSERT INTO\b|\bUPDATE \w+ SET\b|syntax error at|QueryFailedError|TypeORMError/;

let t: TestApp;
let world: World;
let owner: Client;

beforeAll(async () => {
  t = await startTestApp();
  const created = await createWorld(t.db, t.env);
  world = created.world;
  owner = await signedInClient(t.app, created.people.owner.email, testPassword);
}, 60_000);
afterAll(async () => {
  await removeStoredDocuments();
  await t.close();
});

function check(route: string, response: supertest.Response, extra: Record<string, unknown>) {
  const text = JSON.stringify(response.body ?? response.text ?? '');
  expect(
    { route, ...extra, status: response.status, leak: leak.test(text) },
    text.slice(0, 400),
  ).toEqual({
    route,
    ...extra,
    status: expect.any(Number),
    leak: false,
  });
  expect(
    response.status,
    `${route} answered ${response.status}: ${text.slice(0, 300)}`,
  ).toBeLessThan(500);
  if (response.status >= 400 && response.type === 'application/json') {
    expect(typeof response.body.error?.code, `${route} uses the error envelope`).toBe('string');
  }
}

// Routes whose bodies are not JSON, or which end the fuzzer's own session.
const skipped = new Set([
  'DELETE /api/session',
  'POST /api/documents',
  'POST /api/payments/webhook',
]);

describe('fuzzing every API route', () => {
  it('when malformed JSON arrives then 400; when the body is too large then 413', async () => {
    const bad = await owner.agent
      .post('/api/yards')
      .set('X-CSRF-Token', owner.csrf)
      .set('Content-Type', 'application/json')
      .send('{"name": "x",');
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('bad_request');
    const big = await owner.post('/api/yards', { name: 'x', notes: 'y'.repeat(1_100_000) });
    expect(big.status).toBe(413);
  });

  it('covers every route the app declares', () => {
    const routes: string[] = t.app.locals.apiRoutes;
    expect(routes.length).toBeGreaterThan(50);
  });

  const routes = (): string[] => t.app.locals.apiRoutes;
  // Routes are read at run time from the app; vitest needs the names up front, so one test walks all.
  it('when each write gets hostile bodies then no 5xx, no leaks, and refused writes change nothing', async () => {
    for (const route of routes()) {
      if (skipped.has(route)) continue;
      const { method, path, resource, hasId, tail } = routeParts(route);
      if (method === 'GET') continue;
      await fc.assert(
        fc.asyncProperty(spoils, async (spoil) => {
          const id = hasId ? await freshTarget(t.db, world, resource, method) : null;
          let url = await withLoad(t.db, world, path.replace(':id', id ?? ''), id);
          if (spoil.kind === 'id' && hasId)
            url = path.replace(':id', spoil.id).replace(':loadId', spoil.id);
          const valid = (await bodyFor(t.db, world, method, resource, tail, id)) as
            Record<string, unknown> | undefined;
          const before = await snapshot(t.db, world.operationId);
          const request = owner.agent[method.toLowerCase() as 'post' | 'patch' | 'put'](url)
            .set('X-CSRF-Token', owner.csrf)
            .set('Content-Type', 'application/json');
          const response = await request.send(spoiledJson(valid ?? {}, spoil));
          check(route, response, { spoil: spoil.kind });
          if (response.status >= 400) {
            expect(
              await snapshot(t.db, world.operationId),
              `${route} refused ${JSON.stringify(spoil).slice(0, 120)} yet changed rows`,
            ).toBe(before);
          }
        }),
        { numRuns: 6, seed: 20261202 },
      );
    }
  }, 300_000);

  it('when each read gets hostile ids and repeated or hostile query parameters then no 5xx and no leaks', async () => {
    const queryValue = fc.constantFrom(
      '-1',
      '99999999999999999999',
      'abc',
      '%00',
      'x'.repeat(3000),
      '2027-02-30',
      'true',
      '[]',
    );
    const queryKey = fc.constantFrom(
      'limit',
      'offset',
      'q',
      'status',
      'crop',
      'season',
      'on',
      'from',
      'to',
      'placeId',
      'archived',
      'sort',
      'nightOf',
      'yardId',
      '__proto__',
    );
    for (const route of routes()) {
      const { method, path, resource, hasId } = routeParts(route);
      if (method !== 'GET' || skipped.has(route)) continue;
      await fc.assert(
        fc.asyncProperty(
          queryKey,
          queryValue,
          fc.boolean(),
          badIds,
          async (key, value, repeat, badId) => {
            const id = hasId ? await freshTarget(t.db, world, resource, method) : null;
            const base =
              (await withLoad(t.db, world, path.replace(':id', id ?? ''), id)) +
              (routeQueries[route] ?? '');
            const joiner = base.includes('?') ? '&' : '?';
            const query = repeat ? `${key}=${value}&${key}=${value}` : `${key}=${value}`;
            check(route, await owner.get(`${base}${joiner}${query}`), { query: key });
            if (hasId)
              check(route, await owner.get(path.replace(':id', badId).replace(':loadId', badId)), {
                badId,
              });
          },
        ),
        { numRuns: 4, seed: 20261202 },
      );
    }
  }, 300_000);
});

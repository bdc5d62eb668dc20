import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import supertest from 'supertest';
import {
  anonymousClient,
  signedInClient,
  startTestApp,
  type TestApp,
} from '../../../support/test-app';
import { createCrew, createUser, testPassword } from '../../../support/factories';
import { createApp } from '../../../../server/app';

let t: TestApp;
let people: Awaited<ReturnType<typeof createCrew>>;

beforeAll(async () => {
  t = await startTestApp();
  people = await createCrew(t.db);
});
afterAll(() => t.close());

const sessionCookie = (response: supertest.Response) =>
  ([] as string[])
    .concat(response.headers['set-cookie'] ?? [])
    .find((c) => c.startsWith('duskhaul.sid='));

describe('/api/session', () => {
  it('when signed out then GET answers no user and a CSRF token', async () => {
    const response = await supertest(t.app).get('/api/session').expect(200);
    expect(response.body.user).toBeNull();
    expect(response.body.csrfToken).toMatch(/.{20,}/);
  });

  it('when signing in then the session id changes and the cookie is HttpOnly and SameSite=Lax', async () => {
    const agent = supertest.agent(t.app);
    const first = await agent.get('/api/session');
    const before = sessionCookie(first)?.split(';')[0];
    const signIn = await agent
      .post('/api/session')
      .set('X-CSRF-Token', first.body.csrfToken)
      .send({ email: people.planner.email.toUpperCase(), password: testPassword })
      .expect(200);
    const cookie = sessionCookie(signIn)!;
    expect(cookie.split(';')[0]).not.toBe(before);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(signIn.body.user).toMatchObject({
      email: people.planner.email,
      role: 'planner',
      operationId: people.operationId,
    });
    expect(signIn.body.user.passwordHash).toBeUndefined();
  });

  it('when an unsafe request has no CSRF token then 403 and nothing is written', async () => {
    const client = await signedInClient(t.app, people.planner.email, testPassword);
    const response = await client.agent
      .post('/api/yards')
      .send({ name: 'No token', latitude: 28, longitude: -98, capacity: 1 })
      .expect(403);
    expect(response.body.error.code).toBe('csrf_invalid');
    const rows = await t.db.query(`SELECT 1 FROM yards WHERE name = 'No token'`);
    expect(rows).toHaveLength(0);
  });

  it('when signing in without the CSRF token then 403', async () => {
    await supertest(t.app)
      .post('/api/session')
      .send({ email: people.planner.email, password: testPassword })
      .expect(403);
  });

  it('when the sixth attempt follows five failures for one e-mail then 429 with Retry-After, even with the right password', async () => {
    const user = await createUser(t.db, people.operationId, 'crew');
    const client = await anonymousClient(t.app);
    for (let i = 0; i < 5; i++) {
      const wrong = await client
        .post('/api/session', { email: user.email, password: 'not-the-password' })
        .expect(401);
      expect(wrong.body.error.message).toBe('Wrong e-mail or password.');
    }
    const locked = await client
      .post('/api/session', { email: user.email, password: testPassword })
      .expect(429);
    expect(Number(locked.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('when the e-mail is unknown then the answer is the same as for a wrong password', async () => {
    const client = await anonymousClient(t.app);
    const unknown = await client
      .post('/api/session', { email: 'nobody-here@example.test', password: 'whatever-it-is' })
      .expect(401);
    const wrong = await client
      .post('/api/session', { email: people.crew.email, password: 'whatever-it-is' })
      .expect(401);
    expect(unknown.body).toEqual(wrong.body);
  });

  it('when signing out then the old cookie no longer works on the server', async () => {
    const client = await signedInClient(t.app, people.owner.email, testPassword);
    const cookie = (await client.get('/api/session')).request.cookies;
    await client.delete('/api/session').expect(204);
    // Replaying the old cookie from another client gets nowhere.
    await supertest(t.app).get('/api/yards').set('Cookie', cookie).expect(401);
  });

  it('when the owner deactivates a user then that user is refused at once', async () => {
    const user = await createUser(t.db, people.operationId, 'crew');
    const crew = await signedInClient(t.app, user.email, testPassword);
    await crew.get('/api/yards').expect(200);
    const owner = await signedInClient(t.app, people.owner.email, testPassword);
    await owner.patch(`/api/users/${user.id}`, { version: 1, active: false }).expect(200);
    await crew.get('/api/yards').expect(401);
    const again = await anonymousClient(t.app);
    await again.post('/api/session', { email: user.email, password: testPassword }).expect(401);
  });

  it('when a user changes their password then their other sessions end and this one stays', async () => {
    const user = await createUser(t.db, people.operationId, 'planner');
    const phone = await signedInClient(t.app, user.email, testPassword);
    const laptop = await signedInClient(t.app, user.email, testPassword);
    await laptop
      .post('/api/session/password', {
        currentPassword: testPassword,
        newPassword: 'a-new-long-passphrase',
      })
      .expect(204);
    await phone.get('/api/yards').expect(401);
    await laptop.get('/api/yards').expect(200);
  });

  it('when a new password is one of the most common then 400 names newPassword', async () => {
    const client = await signedInClient(t.app, people.crew.email, testPassword);
    const response = await client
      .post('/api/session/password', { currentPassword: testPassword, newPassword: 'password123' })
      .expect(400);
    expect(response.body.error.details[0].field).toBe('newPassword');
  });

  it('when a session is older than the absolute lifetime then it ends however active', async () => {
    const app = createApp({ db: t.db, env: { ...t.env, SESSION_ABSOLUTE_HOURS: 1 } });
    const client = await signedInClient(app, people.crew.email, testPassword);
    await client.get('/api/yards').expect(200);
    await t.db.query(
      `UPDATE sessions SET sess = jsonb_set(sess::jsonb, '{signedInAt}', to_jsonb((extract(epoch FROM now()) * 1000 - 2 * 3600 * 1000)::bigint))::json
        WHERE sess -> 'passport' ->> 'user' = $1`,
      [people.crew.id],
    );
    await client.get('/api/yards').expect(401);
  });

  it('when a session sits idle past its limit then it has expired in the store', async () => {
    const client = await signedInClient(t.app, people.planner.email, testPassword);
    await client.get('/api/yards').expect(200);
    await t.db.query(
      `UPDATE sessions SET expire = now() - interval '1 minute' WHERE sess -> 'passport' ->> 'user' = $1`,
      [people.planner.id],
    );
    await client.get('/api/yards').expect(401);
  });

  it('when any page is served then the security headers are strict', async () => {
    const response = await supertest(t.app).get('/api/health').expect(200);
    const csp = response.headers['content-security-policy'];
    expect(csp).toContain("script-src 'self'");
    expect(csp).toContain("base-uri 'none'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(response.headers['x-powered-by']).toBeUndefined();
    expect(response.headers['x-content-type-options']).toBe('nosniff');
  });
});

describe('request bodies', () => {
  it('when the JSON is malformed then 400 in the envelope', async () => {
    const client = await signedInClient(t.app, people.planner.email, testPassword);
    const response = await client.agent
      .post('/api/yards')
      .set('X-CSRF-Token', client.csrf)
      .set('Content-Type', 'application/json')
      .send('{"name": ')
      .expect(400);
    expect(response.body.error.code).toBe('bad_request');
  });

  it('when the body is over the limit then 413 in the envelope', async () => {
    const client = await signedInClient(t.app, people.planner.email, testPassword);
    const response = await client
      .post('/api/yards', { name: 'x', notes: 'y'.repeat(1_100_000) })
      .expect(413);
    expect(response.body.error.code).toBe('payload_too_large');
  });
});

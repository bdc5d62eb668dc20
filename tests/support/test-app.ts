import 'reflect-metadata';
import supertest from 'supertest';
import type { DataSource } from 'typeorm';
import { createApp } from '../../server/app';
import { loadEnv } from '../../server/config/env';
import { createDataSource } from '../../server/db/data-source';

/** The real app over the test PostgreSQL (DATABASE_URL from `npm test`). */
export async function startTestApp() {
  const env = loadEnv({ ...process.env, NODE_ENV: 'test', CLIENT_DIST: 'no-client-in-api-tests' });
  const db: DataSource = createDataSource({ url: env.DATABASE_URL, poolSize: 5 });
  await db.initialize();
  const app = createApp({ db, env, log: () => undefined });
  return { app, db, env, close: () => db.destroy() };
}

export type TestApp = Awaited<ReturnType<typeof startTestApp>>;

/** A supertest agent that keeps cookies and sends the CSRF token on every unsafe request. */
export interface Client {
  agent: ReturnType<typeof supertest.agent>;
  csrf: string;
  get(url: string): supertest.Test;
  post(url: string, body?: object): supertest.Test;
  patch(url: string, body?: object): supertest.Test;
  put(url: string, body?: object): supertest.Test;
  delete(url: string): supertest.Test;
}

/** An anonymous client with a CSRF token. */
export async function anonymousClient(app: TestApp['app']): Promise<Client> {
  const agent = supertest.agent(app);
  const session = await agent.get('/api/session').expect(200);
  const client: Client = {
    agent,
    csrf: session.body.csrfToken,
    get: (url) => agent.get(url),
    post: (url, body) =>
      agent
        .post(url)
        .set('X-CSRF-Token', client.csrf)
        .send(body ?? {}),
    patch: (url, body) =>
      agent
        .patch(url)
        .set('X-CSRF-Token', client.csrf)
        .send(body ?? {}),
    put: (url, body) =>
      agent
        .put(url)
        .set('X-CSRF-Token', client.csrf)
        .send(body ?? {}),
    delete: (url) => agent.delete(url).set('X-CSRF-Token', client.csrf),
  };
  return client;
}

/** A client signed in as the given user. */
export async function signedInClient(
  app: TestApp['app'],
  email: string,
  password: string,
): Promise<Client> {
  const client = await anonymousClient(app);
  const response = await client.post('/api/session', { email, password });
  if (response.status !== 200)
    throw new Error(
      `sign-in as ${email} failed: ${response.status} ${JSON.stringify(response.body)}`,
    );
  client.csrf = response.body.csrfToken;
  return client;
}

import { createServer, connect, type Server, type Socket } from 'node:net';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { createApp } from '../../../server/app';
import { loadEnv } from '../../../server/config/env';
import { createDataSource } from '../../../server/db/data-source';
import { signedInClient, type Client } from '../../support/test-app';
import { createCrew, testPassword } from '../../support/factories';

/**
 * A TCP proxy between the app and PostgreSQL that the test can cut and restore: the database
 * becomes unreachable mid-traffic without stopping the cluster other test files share.
 */
class CuttableProxy {
  private server: Server | null = null;
  private readonly sockets = new Set<Socket>();
  port = 0;

  constructor(private readonly target: { host: string; port: number }) {}

  async open() {
    this.server = createServer((client) => {
      const upstream = connect(this.target.port, this.target.host);
      for (const s of [client, upstream]) {
        this.sockets.add(s);
        s.on('close', () => this.sockets.delete(s));
        s.on('error', () => s.destroy());
      }
      client.pipe(upstream).pipe(client);
    });
    await new Promise<void>((resolve) => this.server!.listen(this.port, '127.0.0.1', resolve));
    this.port = (this.server!.address() as AddressInfo).port;
  }

  /** Drops every connection and stops answering, as a dead network or database would. */
  async cut() {
    for (const s of this.sockets) s.destroy();
    await new Promise<void>((resolve) => this.server!.close(() => resolve()));
  }
}

let proxy: CuttableProxy;
let db: DataSource;
let planner: Client;
let app: ReturnType<typeof createApp>;

beforeAll(async () => {
  const real = new URL(process.env.DATABASE_URL!);
  proxy = new CuttableProxy({ host: real.hostname, port: Number(real.port || 5432) });
  await proxy.open();
  const viaProxy = new URL(real.toString());
  viaProxy.port = String(proxy.port);
  const env = loadEnv({ ...process.env, DATABASE_URL: viaProxy.toString(), CLIENT_DIST: 'none' });
  db = createDataSource({ url: env.DATABASE_URL, poolSize: 4, statementTimeoutMs: 2_000 });
  await db.initialize();
  app = createApp({ db, env, log: () => undefined });
  const people = await createCrew(db);
  planner = await signedInClient(app, people.planner.email, testPassword);
});
afterAll(async () => {
  await proxy.cut().catch(() => undefined);
  await db.destroy().catch(() => undefined);
});

describe('when the database becomes unreachable mid-traffic', () => {
  it('then every request answers 503 with Retry-After within 3 s, and the app serves again within 5 s of its return', async () => {
    await planner.get('/api/yards').expect(200);
    await proxy.cut();

    const requests = [
      () => planner.get('/api/yards'),
      () => planner.get('/api/contracts'),
      () =>
        planner.post('/api/yards', {
          name: 'During outage',
          latitude: 28,
          longitude: -98,
          capacity: 10,
        }),
      () => planner.get('/api/health'),
    ];
    const answers = await Promise.all(
      requests.map(async (send) => {
        const started = Date.now();
        const response = await send();
        return {
          status: response.status,
          retryAfter: response.headers['retry-after'],
          code: response.body.error?.code ?? response.body.db,
          ms: Date.now() - started,
        };
      }),
    );
    for (const answer of answers) {
      expect(answer.status).toBe(503);
      expect(Number(answer.retryAfter)).toBeGreaterThan(0);
      expect(answer.ms).toBeLessThan(3_000);
    }
    expect(answers.map((a) => a.code)).toEqual([
      'service_unavailable',
      'service_unavailable',
      'service_unavailable',
      'down',
    ]);

    await proxy.open();
    const back = Date.now();
    let status = 0;
    while (Date.now() - back < 5_000) {
      status = (await planner.get('/api/yards')).status;
      if (status === 200) break;
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    expect(status).toBe(200);
    expect(Date.now() - back).toBeLessThan(5_000);
    // Nothing from the outage was written.
    expect(await db.query(`SELECT 1 FROM yards WHERE name = 'During outage'`)).toHaveLength(0);
  });
});

import 'reflect-metadata';
import { randomBytes } from 'node:crypto';
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer, type AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { createApp } from '../../../server/app';
import { loadEnv } from '../../../server/config/env';
import { createDataSource } from '../../../server/db/data-source';
import { seedDemo } from '../../../server/db/seed';

export const demoPassword = 'duskhaul-demo';
export const screenshotDir = path.resolve('test-output/screenshots');

export interface E2eOptions {
  /** Variables laid over process.env for this app (e.g. the fake payment provider's). */
  env?: Record<string, string>;
  /** Listen on this port instead of a free one, when APP_URL must be known up front. */
  port?: number;
  /** Let the app's service worker run (benchmarks of the offline cache); tests block it. */
  serviceWorkers?: 'allow' | 'block';
}

/**
 * The built client and the API on a free port, over a database of its own holding the demo
 * scenario, and a headless Debian Chromium that records every request it makes.
 */
export async function startE2e(options: E2eOptions = {}) {
  const base = new URL(process.env.DATABASE_URL!);
  const name = `duskhaul_e2e_${randomBytes(4).toString('hex')}`;
  const admin = new pg.Client({ connectionString: base.toString() });
  await admin.connect();
  await admin.query(`CREATE DATABASE ${name}`);
  await admin.end();
  const url = new URL(base.toString());
  url.pathname = `/${name}`;

  const db = createDataSource({ url: url.toString(), poolSize: 5 });
  await db.initialize();
  await db.runMigrations();
  await seedDemo(db);
  const env = loadEnv({
    ...process.env,
    DATABASE_URL: url.toString(),
    NODE_ENV: 'test',
    CLIENT_DIST: 'dist',
    ...options.env,
  });
  const server = createApp({ db, env, log: () => undefined }).listen(
    options.port ?? 0,
    '127.0.0.1',
  );
  await new Promise((resolve) => server.once('listening', resolve));
  const origin = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;

  const profile = mkdtempSync(path.join(tmpdir(), 'duskhaul-chromium-'));
  const browser: BrowserContext = await chromium.launchPersistentContext(profile, {
    executablePath: '/usr/bin/chromium',
    headless: true,
    // The app's service worker answers from its cache when the network is slow; on a busy machine
    // that served a stale session after sign-out. Tests talk to the server itself.
    serviceWorkers: options.serviceWorkers ?? 'block',
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  const requests: string[] = [];
  browser.on('request', (request) => requests.push(request.url()));
  mkdirSync(screenshotDir, { recursive: true });

  return {
    origin,
    db,
    browser,
    /** Every URL the browser asked for, to prove nothing leaves the host. */
    requests,
    async newPage(viewport = { width: 1280, height: 860 }) {
      const page = await browser.newPage();
      await page.setViewportSize(viewport);
      return page;
    },
    async close() {
      await browser.close();
      await new Promise((resolve) => server.close(resolve));
      server.closeAllConnections();
      await db.destroy();
      rmSync(profile, { recursive: true, force: true });
      const cleanup = new pg.Client({ connectionString: base.toString() });
      await cleanup.connect();
      await cleanup.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
      await cleanup.end();
    },
  };
}

export type E2e = Awaited<ReturnType<typeof startE2e>>;

/** A port free on loopback right now (for an app whose own address must be configured). */
export async function freePort(): Promise<number> {
  const probe = createServer();
  await new Promise<void>((resolve) => probe.listen(0, '127.0.0.1', resolve));
  const { port } = probe.address() as AddressInfo;
  await new Promise((resolve) => probe.close(resolve));
  return port;
}

/** Signs in through the sign-in page as a person would. */
export async function signIn(page: Page, origin: string, email: string, password = demoPassword) {
  // One browser profile serves the whole file: start each sign-in signed out.
  await page.context().clearCookies();
  await page.goto(`${origin}/sign-in`);
  await page.getByLabel(/e-?mail/i).fill(email);
  await page.getByLabel(/password/i).fill(password);
  await page.getByRole('button', { name: /sign in/i }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}

/** Saves a full-page screenshot under test-output/screenshots for reviewers. */
export async function screenshot(page: Page, name: string) {
  await page.screenshot({ path: path.join(screenshotDir, `${name}.png`), fullPage: true });
}

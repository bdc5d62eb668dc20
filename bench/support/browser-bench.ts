/**
 * Shared by the browser benchmarks (plain scripts, not tests): the e2e harness (a throwaway
 * database with the demo seed, the built client served by the real app, headless Chromium),
 * figures and the demo operation's ids.
 *
 * The client build: `dist/` of the checkout, or, with BENCH_CLIENT_ROOT set (scripts/bench-browser.sh
 * builds into a throwaway folder so a concurrent build or e2e run keeps its own dist/), the
 * `dist/` under that folder.
 */
import 'reflect-metadata';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';

export const DEMO_OPERATION = 'Mesquite Flats Apiaries';

/** Median and p95 (nearest rank) of a list of samples, in the unit given. */
export function stats(samples: number[]) {
  const sorted = [...samples].sort((a, b) => a - b);
  const at = (q: number) => sorted[Math.min(sorted.length - 1, Math.ceil(q * sorted.length) - 1)];
  return { median: at(0.5), p95: at(0.95), min: sorted[0], max: sorted[sorted.length - 1] };
}

export function report(label: string, samples: number[]) {
  const s = stats(samples);
  console.log(
    `${label.padEnd(64)} median ${s.median.toFixed(0).padStart(6)} ms   p95 ${s.p95.toFixed(0).padStart(6)} ms   (n=${samples.length}, min ${s.min.toFixed(0)}, max ${s.max.toFixed(0)})`,
  );
  return s;
}

/** Starts the e2e harness on the client build; exits with a clear message when it cannot. */
export async function startBench() {
  if (!process.env.DATABASE_URL) {
    console.log(
      'skipped: set DATABASE_URL (a PostgreSQL server the bench may create databases on)',
    );
    process.exit(0);
  }
  if (!existsSync('/usr/bin/chromium')) {
    console.log('skipped: /usr/bin/chromium is missing');
    process.exit(0);
  }
  process.env.SESSION_SECRET ??= 'bench-secret-not-for-production-0123456789';
  process.env.NODE_ENV = 'test';
  const root = process.env.BENCH_CLIENT_ROOT;
  if (root) process.chdir(root);
  if (!existsSync(path.resolve('dist/index.html'))) {
    console.log(`skipped: no client build at ${path.resolve('dist')} (run npx vite build)`);
    process.exit(0);
  }
  const { startE2e } = await import('../../tests/e2e/support/e2e-app');
  // The offline bench measures the service worker's cache, so it must be allowed to run.
  return startE2e({ serviceWorkers: 'allow' });
}

export type Bench = Awaited<ReturnType<typeof startBench>>;

/** The demo operation's id. */
export async function demoOperationId(bench: Bench): Promise<string> {
  const [op] = await bench.db.query(`SELECT id FROM operations WHERE name = $1`, [DEMO_OPERATION]);
  return op.id as string;
}

/** The CSRF token of the page's session, for a state-changing request made outside the page. */
export async function csrfToken(page: Page, origin: string): Promise<string> {
  const response = await page.request.get(`${origin}/api/session`);
  const body = (await response.json()) as { csrfToken?: string };
  return body.csrfToken ?? '';
}

/** Today in UTC as the server's ledger sees it (yyyy-mm-dd). */
export const todayIso = () => new Date().toISOString().slice(0, 10);

export const addDaysIso = (on: string, days: number) =>
  new Date(Date.parse(`${on}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

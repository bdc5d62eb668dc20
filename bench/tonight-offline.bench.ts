/**
 * Tonight offline benchmark (issue 5; a plain script, not a test):
 *   DATABASE_URL=postgres://…/any node --import tsx bench/tonight-offline.bench.ts
 *
 * The crew lead opens Tonight once with signal (the service worker installs, the API's answers
 * are kept), then loses signal and reopens it: measured is each reload of /tonight, from
 * navigation start to the moves list being visible, served from the cache.
 *
 * The service worker registers only on a secure context, so Chromium reaches the app at
 * http://localhost:<port> (a secure context) through a small TCP relay on loopback. "Offline"
 * is both Playwright's network emulation and the relay refusing to forward, so not one byte
 * reaches the server even if the emulation missed the worker's own fetches; the relay counts
 * the connections it turned away.
 */
import net from 'node:net';
import type { AddressInfo } from 'node:net';
import { report, startBench } from './support/browser-bench';

const RUNS = Number(process.env.BENCH_RUNS ?? 10);
const MOVES_LIST = 'section[data-move]';

const bench = await startBench();
const sockets = new Set<net.Socket>();
let offline = false;
let refused = 0;
let forwarded = 0;
const relay = net.createServer((client) => {
  if (offline) {
    refused++;
    client.destroy();
    return;
  }
  forwarded++;
  const upstream = net.connect(Number(new URL(bench.origin).port), '127.0.0.1');
  sockets.add(client).add(upstream);
  client.pipe(upstream).pipe(client);
  const close = () => {
    client.destroy();
    upstream.destroy();
    sockets.delete(client);
    sockets.delete(upstream);
  };
  client.on('error', close).on('close', close);
  upstream.on('error', close).on('close', close);
});
try {
  await new Promise<void>((resolve) => relay.listen(0, '127.0.0.1', resolve));
  const origin = `http://localhost:${(relay.address() as AddressInfo).port}`;
  const { signIn } = await import('../tests/e2e/support/e2e-app');
  const page = await bench.newPage({ width: 412, height: 900 });
  await signIn(page, origin, 'crew@demo.test');
  await page.goto(`${origin}/tonight`);
  await page.locator(MOVES_LIST).first().waitFor();
  const secure = await page.evaluate(() => window.isSecureContext);
  const sw = await page.evaluate(async () => {
    if (!('serviceWorker' in navigator)) return 'no serviceWorker in navigator';
    const ready = await Promise.race([
      navigator.serviceWorker.ready.then(() => 'ready'),
      new Promise((resolve) => setTimeout(() => resolve('timed out after 60 s'), 60_000)),
    ]);
    return String(ready);
  });
  // Once more with signal, now under the worker's control, so its runtime cache holds the API reads.
  await page.reload();
  await page.locator(MOVES_LIST).first().waitFor();
  await page.waitForLoadState('networkidle');
  await page.waitForTimeout(1000);
  const controlled = await page.evaluate(() => Boolean(navigator.serviceWorker?.controller));
  const cached = await page.evaluate(async () => {
    const names = await caches.keys();
    let entries = 0;
    for (const name of names) entries += (await (await caches.open(name)).keys()).length;
    return `${names.join(', ') || 'none'} (${entries} entries)`;
  });
  const moves = await page.locator(MOVES_LIST).count();
  console.log(
    `== Tonight offline: ${origin} secure context ${secure}, service worker ${sw}, controls page ${controlled}; caches ${cached}; ${moves} move(s) listed`,
  );

  // Online reloads first, for comparison.
  const timeToList = async () => {
    await page.reload({ waitUntil: 'commit' });
    const handle = await page.waitForFunction(
      (sel) => {
        const el = document.querySelector(sel);
        return el && (el as HTMLElement).offsetParent !== null ? performance.now() : false;
      },
      MOVES_LIST,
      { polling: 'raf', timeout: 30_000 },
    );
    return (await handle.jsonValue()) as number;
  };
  await timeToList();
  const online: number[] = [];
  for (let i = 0; i < RUNS; i++) online.push(await timeToList());

  offline = true;
  for (const socket of sockets) socket.destroy();
  await page.context().setOffline(true);
  const offlineSamples: number[] = [];
  const failures: string[] = [];
  for (let i = 0; i < RUNS; i++) {
    try {
      offlineSamples.push(await timeToList());
    } catch (error) {
      failures.push(String(error).split('\n')[0]);
      break;
    }
  }
  await page.context().setOffline(false);
  report('online: reload /tonight -> moves list visible', online);
  if (offlineSamples.length > 0)
    report(
      controlled
        ? 'offline (service worker cache): reload /tonight -> moves list visible'
        : 'offline WITHOUT a service worker: reload /tonight -> moves list visible',
      offlineSamples,
    );
  if (failures.length)
    console.log(`   offline reload failed (${failures[0]}): the app did not open from cache`);
  console.log(
    `   relay: ${forwarded} connections forwarded while online, ${refused} turned away while offline`,
  );
  if (!controlled)
    console.log(
      '   NOTE: no service worker controlled the page, so the offline figure (if any) is not from the PWA cache',
    );
  await page.close();
} finally {
  offline = true;
  for (const socket of sockets) socket.destroy();
  relay.close();
  await bench.close();
}

/**
 * Planner page benchmark (issue 5; a plain script, not a test):
 *   DATABASE_URL=postgres://…/any node --import tsx bench/planner-page.bench.ts
 *
 * A 40-truck night from 12 yards for the demo operation, planned at /moves/new in headless
 * Chromium. Measured: from an input change (the colonies of one yard; the loading minutes) to the
 * DOM showing the updated load sheet or timeline. That span includes the planner's ~300 ms
 * debounce on purpose: it is what the planner waits. In the same run, the server-only time of
 * `POST /api/moves/preview` for the very body the page sent, so the client's share shows.
 */
import {
  addDaysIso,
  csrfToken,
  demoOperationId,
  report,
  startBench,
  stats,
  todayIso,
} from './support/browser-bench';

const TRUCKS = 40;
const YARDS = 12;
const COLONIES_PER_YARD = 600;
const RUNS = Number(process.env.BENCH_RUNS ?? 10);
const pad = (i: number) => String(i + 1).padStart(2, '0');

const bench = await startBench();
try {
  const started = performance.now();
  const operationId = await demoOperationId(bench);
  const [lot] = await bench.db.query(
    `SELECT id, name FROM colony_lots WHERE operation_id = $1 AND archived_at IS NULL ORDER BY name LIMIT 1`,
    [operationId],
  );
  for (let i = 0; i < TRUCKS; i++) {
    await bench.db.query(
      `INSERT INTO trucks (operation_id, name, payload_kg, pallet_spots, tiers, tare_kg, legal_gross_kg)
       VALUES ($1, $2, 21000, 24, 2, 14500, 36287.39)`,
      [operationId, `Bench semi ${pad(i)}`],
    );
  }
  for (let i = 0; i < YARDS; i++) {
    const [yard] = await bench.db.query(
      `INSERT INTO yards (operation_id, name, latitude, longitude, capacity)
       VALUES ($1, $2, $3, $4, 2000) RETURNING id`,
      [operationId, `Bench yard ${pad(i)}`, 27.6 + (i % 4) * 0.25, -98.4 + Math.floor(i / 4) * 0.3],
    );
    await bench.db.query(
      `INSERT INTO ledger_entries (operation_id, lot_id, kind, occurred_on, colonies, to_kind, to_id, reason)
       VALUES ($1, $2, 'purchase', '2026-10-01', $3, 'yard', $4, 'bench')`,
      [operationId, lot.id, COLONIES_PER_YARD, yard.id],
    );
  }

  const page = await bench.newPage({ width: 1400, height: 900 });
  const { signIn } = await import('../tests/e2e/support/e2e-app');
  await signIn(page, bench.origin, 'planner@demo.test');
  // A night after the purchases and clear of the demo's own moves.
  const night = addDaysIso(todayIso() < '2026-10-02' ? '2026-10-02' : todayIso(), 7);
  let previewBody: unknown = null;
  page.on('request', (request) => {
    if (request.method() === 'POST' && request.url().endsWith('/api/moves/preview'))
      previewBody = request.postDataJSON();
  });
  await page.goto(`${bench.origin}/moves/new?night=${night}`);
  const form = page.getByRole('form', { name: 'Plan a move' });
  await form.getByLabel('Move name', { exact: true }).fill('Bench: forty trucks');
  await form.getByLabel('Sunfold Block 12').check();
  await form.getByLabel('Drivers per truck').selectOption('2');
  for (let i = 0; i < YARDS; i++)
    await form
      .getByLabel(`Colonies from Bench yard ${pad(i)}, ${lot.name}`)
      .fill(String(COLONIES_PER_YARD));
  for (let i = 0; i < TRUCKS; i++) await form.getByLabel(`Bench semi ${pad(i)}`).check();

  const sheet = page.getByRole('table', { name: 'Load sheet' });
  await sheet.locator(`[data-truck-row="Bench semi ${pad(TRUCKS - 1)}"]`).waitFor();
  await page.locator('[data-timeline-label="Departure"]').waitFor();
  const totalCell = 'table[aria-label="Load sheet"] tfoot td:nth-child(4)';
  const departureCell = '[data-timeline-label="Departure"]';
  const trucksUsed = await page
    .locator('table[aria-label="Load sheet"] tfoot td')
    .first()
    .innerText();
  console.log(
    `== Planner page: ${TRUCKS} trucks, ${YARDS} yards x ${COLONIES_PER_YARD} colonies (${trucksUsed}, ${await page.locator(totalCell).innerText()} colonies loaded), night ${night}; setup ${((performance.now() - started) / 1000).toFixed(1)} s`,
  );

  /**
   * Changes one input and returns ms from its input event to the DOM node at `selector`
   * showing a text other than before (a MutationObserver stamps the moment, in the page).
   */
  const measure = async (
    input: ReturnType<typeof form.getByLabel>,
    value: string,
    selector: string,
  ) => {
    await page.evaluate((sel) => {
      const w = window as unknown as { benchStart: number; benchDone: Promise<number> };
      const before = document.querySelector(sel)?.textContent ?? '';
      w.benchStart = 0;
      document.addEventListener('input', () => (w.benchStart ||= performance.now()), {
        capture: true,
        once: true,
      });
      w.benchDone = new Promise<number>((resolve) => {
        const observer = new MutationObserver(() => {
          const text = document.querySelector(sel)?.textContent;
          if (text && text !== before) {
            observer.disconnect();
            resolve(performance.now());
          }
        });
        observer.observe(document.body, { subtree: true, childList: true, characterData: true });
      });
    }, selector);
    await input.fill(value);
    return page.evaluate(async () => {
      const w = window as unknown as { benchStart: number; benchDone: Promise<number> };
      const done = await w.benchDone;
      return done - w.benchStart;
    });
  };

  // Every value differs from all before it: the page caches previews by body for 30 s.
  const colonies = form.getByLabel(`Colonies from Bench yard 01, ${lot.name}`);
  const loading = form.getByLabel('Loading (minutes)');
  await measure(colonies, String(COLONIES_PER_YARD - 1), totalCell); // warm-up
  const colonySamples: number[] = [];
  for (let i = 0; i < RUNS; i++)
    colonySamples.push(await measure(colonies, String(COLONIES_PER_YARD - 2 - i), totalCell));
  await measure(loading, '121', departureCell); // warm-up
  const loadingSamples: number[] = [];
  for (let i = 0; i < RUNS; i++)
    loadingSamples.push(await measure(loading, String(122 + i), departureCell));

  report('colonies of one yard -> load sheet total updated', colonySamples);
  report('loading minutes -> timeline departure updated', loadingSamples);
  const both = stats([...colonySamples, ...loadingSamples]);

  // The server alone, for the body the page sent last, with the page's own session.
  const token = await csrfToken(page, bench.origin);
  const post = () =>
    page.request.post(`${bench.origin}/api/moves/preview`, {
      data: previewBody,
      headers: { 'X-CSRF-Token': token },
    });
  const first = await post();
  if (first.status() !== 200)
    throw new Error(`preview answered ${first.status()}: ${await first.text()}`);
  const serverSamples: number[] = [];
  for (let i = 0; i < RUNS * 2; i++) {
    const start = performance.now();
    const response = await post();
    await response.body();
    serverSamples.push(performance.now() - start);
  }
  const server = report('POST /api/moves/preview alone (same body, loopback)', serverSamples);
  console.log(
    `   client share (median input->DOM ${both.median.toFixed(0)} ms - server ${server.median.toFixed(0)} ms - debounce 300 ms): ${(both.median - server.median - 300).toFixed(0)} ms`,
  );
  await page.close();
} finally {
  await bench.close();
}

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { screenshot, signIn, startE2e, type E2e } from './support/e2e-app';

let e2e: E2e;
let moveId = '';
const moveName = 'Night run to Sunfold Block 12';

beforeAll(async () => {
  e2e = await startE2e();
});
afterAll(() => e2e?.close());

describe('moves in the browser', () => {
  it('when the planner plans a two-truck move from two yards then the load sheet and timeline show and it is planned', async () => {
    const page = await e2e.newPage({ width: 1400, height: 900 });
    await signIn(page, e2e.origin, 'planner@demo.test');
    await page.goto(`${e2e.origin}/moves/new`);
    const form = page.getByRole('form', { name: 'Plan a move' });
    await form.getByLabel('Move name', { exact: true }).fill(moveName);
    await form.getByLabel('Sunfold Block 12').check();
    await form.getByLabel('Colonies from Tecolote Draw, Two deeps A (2026 queens)').fill('120');
    await form
      .getByLabel('Colonies from Seven Windmills, Two deeps B (North Dakota crew)')
      .fill('150');
    await form.getByLabel('Semi 3 Nighthawk').check();
    await form.getByLabel('Driver 1 of Semi 3 Nighthawk').fill('Delphine Crask');
    await form.getByLabel('Semi 4 Poorwill').check();

    const sheet = page.getByRole('table', { name: 'Load sheet' });
    await sheet.locator('[data-truck-row="Semi 4 Poorwill"]').waitFor();
    expect(await sheet.locator('[data-truck-row]').count()).toBe(2);
    expect(await sheet.locator('[data-truck-row="Semi 3 Nighthawk"]').innerText()).toContain(
      'Tecolote Draw',
    );
    const departure = page.locator('[data-timeline-label="Departure"]');
    await departure.waitFor();
    expect(await departure.innerText()).toMatch(/\d{1,2}:\d{2} [AP]M .*\(UTC[−+]\d+/);
    await screenshot(page, 'move-planner');

    await form.getByRole('button', { name: 'Save as draft' }).click();
    await page.waitForURL(/\/moves\/[0-9a-f-]{36}$/);
    moveId = page.url().split('/').pop()!;
    await page.getByRole('button', { name: 'Plan this move' }).click();
    await page.getByRole('button', { name: 'Start loading' }).waitFor();
    const [row] = await e2e.db.query(`SELECT status FROM moves WHERE id = $1`, [moveId]);
    expect(row.status).toBe('planned');
    const loads = await e2e.db.query(
      `SELECT pallets_planned FROM move_loads WHERE move_id = $1 ORDER BY position`,
      [moveId],
    );
    expect(loads).toHaveLength(2);
    await screenshot(page, 'move-detail');
    await page.close();
  });

  it('when the crew counts pallets and places the move offline then it reaches the office once back online', async () => {
    expect(moveId).not.toBe('');
    const page = await e2e.newPage({ width: 412, height: 900 });
    await signIn(page, e2e.origin, 'crew@demo.test');
    await page.goto(`${e2e.origin}/tonight`);
    const move = page.getByRole('region', { name: moveName });
    await move.waitFor();
    await page.getByText('Everything is sent').waitFor();

    await page.context().setOffline(true);
    const more = page.getByRole('button', { name: 'Pallets loaded on Semi 3 Nighthawk: one more' });
    for (let i = 0; i < 3; i++) await more.click();
    await move.getByRole('button', { name: 'Start loading' }).click();
    await move.getByRole('button', { name: 'Rolling' }).click();
    await move.getByRole('button', { name: 'Placed', exact: true }).click();
    await expect.poll(() => move.getByTestId('move-status').innerText()).toBe('Placed');
    await page.waitForTimeout(1200); // the send attempt made without signal
    expect(await page.getByTestId('sync-status').innerText()).toMatch(
      /^4 changes waiting to send$/,
    );
    await screenshot(page, 'tonight-offline');

    await page.context().setOffline(false);
    await page.getByText('Everything is sent').waitFor({ timeout: 30_000 });
    const [saved] = await e2e.db.query(
      `SELECT m.status, l.pallets_loaded FROM moves m JOIN move_loads l ON l.move_id = m.id
        JOIN trucks t ON t.id = l.truck_id WHERE m.id = $1 AND t.name = 'Semi 3 Nighthawk'`,
      [moveId],
    );
    expect(saved).toEqual({ status: 'placed', pallets_loaded: 3 });
    await screenshot(page, 'tonight-synced');
    await page.close();

    const office = await e2e.newPage();
    await signIn(office, e2e.origin, 'planner@demo.test');
    await office.goto(`${e2e.origin}/moves/${moveId}`);
    await office.getByText('Placed', { exact: true }).first().waitFor();
    expect(await office.locator('main').innerText()).toMatch(/Pallets loaded\s*3/);
    await office.close();
  });

  it('when the load sheet is printed then each truck gets its own page', async () => {
    const page = await e2e.newPage();
    await signIn(page, e2e.origin, 'planner@demo.test');
    await page.goto(`${e2e.origin}/moves/${moveId}/print`);
    const pages = page.locator('.load-sheet-page');
    await pages.first().waitFor();
    expect(await pages.count()).toBe(2);
    await page.emulateMedia({ media: 'print' });
    const breaks = await pages.evaluateAll((els) =>
      els.map((el) => getComputedStyle(el).breakAfter),
    );
    expect(breaks[0]).toBe('page');
    expect(await page.getByRole('button', { name: 'Print' }).isVisible()).toBe(false);
    await screenshot(page, 'load-sheet-print');
    await page.close();
  });
});

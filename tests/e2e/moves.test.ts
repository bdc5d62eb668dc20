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

  it('when the crew signs out with a change not sent then they are asked first, and signing out leaves nothing on the phone', async () => {
    const page = await e2e.newPage({ width: 412, height: 900 });
    await signIn(page, e2e.origin, 'crew@demo.test');
    await page.goto(`${e2e.origin}/tonight`);
    const move = page.getByRole('region', { name: moveName });
    await move.waitFor();
    // The office cannot be reached for syncing; signing out still can.
    await page.route('**/api/moves/sync', (route) => route.abort());
    const semi4 = move.getByRole('article', { name: 'Semi 4 Poorwill' });
    await semi4.getByText('Hive weights and notes').click();
    await semi4.getByLabel('Note').fill('Gate chained, used the east track.');
    await semi4.getByRole('button', { name: 'Keep note' }).click();
    await page.getByText('1 change waiting to send').waitFor();

    const signOut = async () => {
      await page.getByRole('button', { name: 'Menu' }).click();
      await page.locator('#phone-menu').getByRole('button', { name: 'Sign out' }).click();
    };
    await signOut();
    const ask = page.getByRole('dialog', { name: 'Changes not sent yet' });
    await ask.getByText(/1 change from Tonight has not reached the office/).waitFor();
    await screenshot(page, 'sign-out-unsent');
    await ask.getByRole('button', { name: 'Stay signed in' }).click();
    await ask.waitFor({ state: 'detached' });
    expect(await page.getByTestId('sync-status').innerText()).toBe('1 change waiting to send');

    await page.getByRole('button', { name: 'Close menu' }).click();
    await signOut();
    await ask.getByRole('button', { name: 'Sign out and discard' }).click();
    await page.waitForURL(/\/sign-in/);
    const kept = await page.evaluate(
      () =>
        new Promise<number[]>((resolve, reject) => {
          const open = indexedDB.open('duskhaul-tonight');
          open.onerror = () => reject(open.error);
          open.onsuccess = () => {
            const tx = open.result.transaction(['changes', 'snapshots']);
            const counts = ['changes', 'snapshots'].map((name) => tx.objectStore(name).count());
            tx.oncomplete = () => resolve(counts.map((c) => c.result));
          };
        }),
    );
    expect(kept).toEqual([0, 0]);
    const notes = await e2e.db.query(
      `SELECT l.notes FROM move_loads l JOIN trucks t ON t.id = l.truck_id
        WHERE l.move_id = $1 AND t.name = 'Semi 4 Poorwill'`,
      [moveId],
    );
    expect(notes[0].notes).not.toContain('Gate chained');
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

    // The pre-roll check on one truck, kept while there is signal.
    const semi3 = move.getByRole('article', { name: 'Semi 3 Nighthawk' });
    await semi3.locator('summary', { hasText: 'Pre-roll check' }).click();
    for (const item of [
      'Nets on and clipped down',
      'Straps tight on every tier',
      'No loose lids, boxes or bees outside the net',
      'Water aboard to wet the load at a stop',
      'Inspection certificate in the cab',
    ])
      await semi3.getByLabel(item).check();
    await semi3.getByRole('button', { name: 'Keep the check' }).click();
    await semi3.getByText(/· done \d/).waitFor({ timeout: 15_000 });
    await page.getByText('Everything is sent').waitFor();

    // Two colonies too weak to go stay at Tecolote Draw, kept per yard while there is signal.
    await semi3.locator('summary', { hasText: 'Placed, left behind, lost' }).click();
    await semi3.getByLabel('Left behind at Tecolote Draw').fill('2');
    await semi3.getByRole('button', { name: 'Keep placed counts' }).click();
    await expect
      .poll(async () =>
        (
          await e2e.db.query(
            `SELECT l.left_behind_by_stop AS left FROM move_loads l JOIN trucks t ON t.id = l.truck_id
                WHERE l.move_id = $1 AND t.name = 'Semi 3 Nighthawk'`,
            [moveId],
          )
        )[0].left?.map((c: { colonies: number }) => c.colonies),
      )
      .toContain(2);
    await page.getByText('Everything is sent').waitFor();

    await page.context().setOffline(true);
    const more = page.getByRole('button', {
      name: 'Pallets loaded at Tecolote Draw on Semi 3 Nighthawk: one more',
    });
    for (let i = 0; i < 3; i++) await more.click();
    await expect
      .poll(() => semi3.getByTestId('pallets-loaded').innerText())
      .toMatch(/^Pallets loaded: 3 of \d+$/);
    await move.getByRole('button', { name: 'Start loading' }).click();
    // Only the truck without a kept check is named before it rolls.
    const unchecked = move.getByRole('note');
    await unchecked.waitFor();
    expect(await unchecked.innerText()).toMatch(/not kept for Semi 4 Poorwill\./);
    await move.getByRole('button', { name: 'Rolling' }).click();
    await move.getByRole('button', { name: 'Placed', exact: true }).click();
    await expect.poll(() => move.getByTestId('move-status').innerText()).toBe('Placed');
    await page.waitForTimeout(1200); // the send attempt made without signal
    expect(await page.getByTestId('sync-status').innerText()).toMatch(
      /^4 changes waiting to send$/,
    );
    await screenshot(page, 'tonight-offline');

    await page.context().setOffline(false);
    await expect
      .poll(() => page.getByTestId('sync-status').innerText(), { timeout: 30_000 })
      .not.toMatch(/waiting|Sending/);
    // Nothing sent was turned away (a change made before the view caught up is no conflict).
    expect(await page.getByTestId('sync-status').innerText()).toBe('Everything is sent');
    const [saved] = await e2e.db.query(
      `SELECT m.status, l.pallets_loaded, y.name AS first_yard,
              (l.pallets_by_stop -> 0 ->> 'pallets')::int AS first_yard_pallets,
              (l.pre_roll_check ->> 'certificateInCab')::boolean AS certificate,
              l.colonies_left_behind AS left_behind
         FROM moves m JOIN move_loads l ON l.move_id = m.id
         JOIN trucks t ON t.id = l.truck_id
         JOIN yards y ON y.id = (l.pallets_by_stop -> 0 ->> 'yardId')::uuid
        WHERE m.id = $1 AND t.name = 'Semi 3 Nighthawk'`,
      [moveId],
    );
    expect(saved).toEqual({
      status: 'placed',
      pallets_loaded: 3,
      first_yard: 'Tecolote Draw',
      first_yard_pallets: 3,
      certificate: true,
      left_behind: 2,
    });
    await screenshot(page, 'tonight-synced');
    await page.close();

    const office = await e2e.newPage();
    await signIn(office, e2e.origin, 'planner@demo.test');
    await office.goto(`${e2e.origin}/moves/${moveId}`);
    await office.getByText('Placed', { exact: true }).first().waitFor();
    expect(await office.locator('main').innerText()).toMatch(/Pallets loaded\s*3/);
    const records = office.getByRole('table', { name: 'Crew records' });
    const truck = records.locator('[data-crew-truck="Semi 3 Nighthawk"]');
    expect(await truck.getByTestId('truck-loaded').innerText()).toBe('3');
    expect(await truck.innerText()).toContain('All ticked');
    const tecolote = truck.locator('[data-crew-stop="Tecolote Draw"] td');
    expect(await tecolote.nth(2).innerText()).toBe('3');
    expect(await tecolote.nth(4).innerText()).toBe('2 left in this yard');
    await screenshot(office, 'move-crew-records');
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

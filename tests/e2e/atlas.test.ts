import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { screenshot, signIn, startE2e, type E2e } from './support/e2e-app';

let e2e: E2e;
let page: Page;

beforeAll(async () => {
  e2e = await startE2e();
  page = await e2e.newPage();
  await signIn(page, e2e.origin, 'planner@demo.test');
});
afterAll(() => e2e?.close());

const map = () => page.getByRole('region', { name: 'Map of yards, sites and moves' });
/** What the overlay canvas shows (the Atlas draws its records on one canvas), as a data URL. */
const overlayPicture = () =>
  page
    .locator('.leaflet-overlay-pane canvas')
    .first()
    .evaluate((c) => (c as HTMLCanvasElement).toDataURL());
/** How many pixels of the overlay canvas are painted. */
const paintedPixels = () =>
  page
    .locator('.leaflet-overlay-pane canvas')
    .first()
    .evaluate((c) => {
      const canvas = c as HTMLCanvasElement;
      const data = canvas.getContext('2d')!.getImageData(0, 0, canvas.width, canvas.height).data;
      let painted = 0;
      for (let i = 3; i < data.length; i += 4) if (data[i] > 0) painted++;
      return painted;
    });

describe('Atlas in the browser', () => {
  it('when a planner signs in then the Atlas opens on the demo season with tiles from our own server', async () => {
    await page.waitForURL(/\/atlas/);
    await map().waitFor();
    await page.waitForLoadState('networkidle');
    expect(e2e.requests.some((url) => url.startsWith(`${e2e.origin}/tiles/base/`))).toBe(true);
    await expect.poll(paintedPixels).toBeGreaterThan(100);
    await screenshot(page, 'atlas-day');
  });

  it('when a layer is switched off then its shapes leave the map, and come back when switched on', async () => {
    const before = await overlayPicture();
    const painted = await paintedPixels();
    const yards = page.getByRole('checkbox', { name: 'Yards', exact: true });
    await yards.uncheck();
    await expect.poll(paintedPixels).toBeLessThan(painted);
    await yards.check();
    await expect.poll(overlayPicture).toBe(before);
  });

  it('when a yard is chosen then the side panel shows it with its colonies and a link to its record', async () => {
    const [yard] = await e2e.db.query(
      `SELECT y.id, y.name FROM yards y JOIN operations o ON o.id = y.operation_id WHERE o.name = 'Mesquite Flats Apiaries' ORDER BY y.name LIMIT 1`,
    );
    await page.getByLabel('Find a yard, site or grower').fill(yard.name);
    await page
      .getByRole('button', { name: new RegExp(yard.name) })
      .first()
      .click();
    const panel = page.getByRole('complementary');
    await panel.getByRole('heading', { name: yard.name }).waitFor();
    expect(
      await panel
        .getByRole('link')
        .evaluateAll((links) => links.map((a) => a.getAttribute('href'))),
    ).toContain(`/yards/${yard.id}`);
    await screenshot(page, 'atlas-yard-panel');
  });

  it('when a planner draws a block on the map then its acreage and drops are saved', async () => {
    const [grower] = await e2e.db.query(
      `SELECT g.id FROM growers g JOIN operations o ON o.id = g.operation_id WHERE o.name = 'Mesquite Flats Apiaries' LIMIT 1`,
    );
    const [operation] = await e2e.db.query(
      `SELECT id FROM operations WHERE name = 'Mesquite Flats Apiaries'`,
    );
    await e2e.db.query(
      `INSERT INTO sites (operation_id, grower_id, name, kind, crop, latitude, longitude) VALUES ($1, $2, 'Unmapped Block 12', 'orchard', 'almond', 36.75, -120.1)`,
      [operation.id, grower.id],
    );
    await page.reload();
    await map().waitFor();
    await page.getByLabel('Find a yard, site or grower').fill('Unmapped Block 12');
    await page
      .getByRole('button', { name: /Unmapped Block 12/ })
      .first()
      .click();
    const panel = page.getByRole('complementary');
    await panel.getByRole('heading', { name: 'Unmapped Block 12' }).waitFor();
    await panel.getByRole('button', { name: 'Draw boundary' }).click();
    await page.waitForTimeout(500);

    const box = (await map().boundingBox())!;
    const cx = box.x + box.width / 2;
    const cy = box.y + box.height / 2;
    const corners = [
      [-60, -40],
      [60, -40],
      [60, 40],
      [-60, 40],
    ];
    for (const [i, [dx, dy]] of corners.entries()) {
      if (i === corners.length - 1) await page.mouse.dblclick(cx + dx, cy + dy);
      else await page.mouse.click(cx + dx, cy + dy);
      await page.waitForTimeout(150);
    }
    await panel.getByRole('button', { name: 'Save boundary' }).click();
    await panel.getByRole('status').filter({ hasText: 'Saved:' }).waitFor();
    const [site] = await e2e.db.query(
      `SELECT area_ha, boundary, drops FROM sites WHERE name = 'Unmapped Block 12'`,
    );
    expect(site.area_ha).toBeGreaterThan(0);
    expect(site.boundary.type).toBe('Polygon');
    expect(site.drops.features.length).toBeGreaterThan(0);
    await screenshot(page, 'atlas-drawn-block');
  });

  it('when a planner asks to plan a move to the selected block then the planner opens with it as the destination', async () => {
    const panel = page.getByRole('complementary');
    await panel.getByRole('link', { name: 'Plan a move to this block' }).click();
    await page.waitForURL(/\/moves\/new\?to=/);
    await expect
      .poll(
        () =>
          page
            .getByLabel(/Unmapped Block 12/)
            .first()
            .isChecked(),
        { timeout: 10_000 },
      )
      .toBe(true);
    await page.goBack();
    await map().waitFor();
  });

  it('when the night style is switched on then the map takes the dim red-on-black look', async () => {
    await page.getByRole('checkbox', { name: /night style/i }).check();
    await expect.poll(() => page.locator('.atlas-map--night').count()).toBe(1);
    await page.waitForLoadState('networkidle');
    await screenshot(page, 'atlas-night');
  });

  it('when the Atlas has been used then every request went to our own origin', () => {
    const foreign = e2e.requests.filter(
      (url) => !url.startsWith(e2e.origin) && !url.startsWith('data:') && !url.startsWith('blob:'),
    );
    expect(foreign).toEqual([]);
  });
});

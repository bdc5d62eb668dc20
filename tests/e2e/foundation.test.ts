import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { screenshot, signIn, startE2e, type E2e } from './support/e2e-app';

let e2e: E2e;

beforeAll(async () => {
  e2e = await startE2e();
});
afterAll(() => e2e?.close());

/** Signs out from the header and checks the server no longer knows the browser. */
async function signOutAndCheck(page: Page) {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.waitForURL(/\/sign-in/);
  const session = await page.evaluate(async () => (await fetch('/api/session')).json());
  expect(session.user).toBeNull();
}

describe('foundation in the browser', () => {
  it('when the planner signs in then the yards of the demo operation are listed', async () => {
    const page = await e2e.newPage();
    await signIn(page, e2e.origin, 'planner@demo.test');
    await page
      .getByRole('link', { name: /^yards$/i })
      .first()
      .click();
    const table = page.getByRole('table');
    await table.waitFor();
    const rows = await table.getByRole('row').count();
    expect(rows).toBeGreaterThan(8); // header + the 8 demo yards
    const [{ name }] = await e2e.db.query(
      `SELECT y.name FROM yards y JOIN operations o ON o.id = y.operation_id WHERE o.name = 'Mesquite Flats Apiaries' ORDER BY y.name LIMIT 1`,
    );
    expect(await table.getByText(name).count()).toBeGreaterThan(0);
    await screenshot(page, 'foundation-planner-yards');
    await signOutAndCheck(page);
    await page.close();
  });

  it('when a grower signs in then only their own contracts are shown', async () => {
    const page = await e2e.newPage();
    await signIn(page, e2e.origin, 'grower@demo.test');
    const [own] = await e2e.db.query(
      `SELECT g.id, g.name FROM users u JOIN growers g ON g.id = u.grower_id WHERE u.email = 'grower@demo.test'`,
    );
    const [other] = await e2e.db.query(
      `SELECT g.name FROM users u JOIN growers g ON g.id = u.grower_id WHERE u.email = 'grower2@demo.test'`,
    );
    const ownContracts = await e2e.db.query(
      `SELECT count(*)::int AS n FROM contracts WHERE grower_id = $1 AND archived_at IS NULL`,
      [own.id],
    );
    const list = page.locator('ul[aria-label="Your contracts"] > li');
    await list.first().waitFor();
    const body = await page.locator('main').innerText();
    expect(body).toContain(own.name);
    expect(body).not.toContain(other.name);
    expect(ownContracts[0].n).toBeGreaterThan(0);
    expect(await list.count()).toBe(ownContracts[0].n);
    await screenshot(page, 'foundation-grower-contracts');
    await signOutAndCheck(page);
    await page.close();
  });

  it('when pages load then every request stays on the same origin', () => {
    const foreign = e2e.requests.filter(
      (url) => !url.startsWith(e2e.origin) && !url.startsWith('data:') && !url.startsWith('blob:'),
    );
    expect(foreign).toEqual([]);
  });
});

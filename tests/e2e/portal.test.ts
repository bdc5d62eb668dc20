import { request } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoPassword, screenshot, signIn, startE2e, type E2e } from './support/e2e-app';

let e2e: E2e;
let contractId = '';
const product = 'Dusk copper spray 50WP';

/** A day `days` from today as YYYY-MM-DD (the browser and the test share the host's zone). */
function dayFromNow(days: number) {
  const d = new Date(Date.now() + days * 86_400_000);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
}

beforeAll(async () => {
  e2e = await startE2e();
  const [contract] = await e2e.db.query(
    `SELECT c.id FROM contracts c JOIN users u ON u.grower_id = c.grower_id
      WHERE u.email = 'grower@demo.test' AND c.status = 'offered' AND c.archived_at IS NULL
      ORDER BY c.id LIMIT 1`,
  );
  contractId = contract.id;

  // The planner proposes dates through the API, as the contract screen does.
  const api = await request.newContext({ baseURL: e2e.origin });
  const { csrfToken } = await (await api.get('/api/session')).json();
  const signedIn = await api.post('/api/session', {
    headers: { 'X-CSRF-Token': csrfToken },
    data: { email: 'planner@demo.test', password: demoPassword },
  });
  expect(signedIn.status()).toBe(200);
  const { csrfToken: token } = await (await api.get('/api/session')).json();
  const proposed = await api.post(`/api/contracts/${contractId}/proposals`, {
    headers: { 'X-CSRF-Token': token },
    data: { deliveryStartOn: '2027-02-08', deliveryEndOn: '2027-02-12', colonies: 240 },
  });
  expect(proposed.status()).toBe(201);
  await api.dispose();
});
afterAll(() => e2e?.close());

describe('orchard portal in the browser', () => {
  it('when the grower confirms the proposed dates and files a spray notice then both are stored', async () => {
    const page = await e2e.newPage();
    await signIn(page, e2e.origin, 'grower@demo.test');
    await page.waitForURL(/\/portal$/);
    const toConfirm = page.getByRole('region', { name: 'Dates to confirm' });
    await toConfirm.getByText('Feb 8, 2027 – Feb 12, 2027').waitFor();
    await screenshot(page, 'portal-dates-to-confirm');
    await page.setViewportSize({ width: 390, height: 844 });
    await screenshot(page, 'portal-phone');
    await page.setViewportSize({ width: 1280, height: 860 });

    await toConfirm.getByLabel('Note to the beekeeper (optional)').fill('Gate code is 4471.');
    await toConfirm.getByRole('button', { name: 'Confirm these dates' }).click();
    await toConfirm.waitFor({ state: 'detached' });
    const [contract] = await e2e.db.query(`SELECT status FROM contracts WHERE id = $1`, [
      contractId,
    ]);
    expect(contract.status).toBe('agreed');
    await page.locator(`[data-contract="${contractId}"]`).getByText('Agreed').waitFor();

    const form = page.getByRole('form', { name: 'File a spray notice' });
    await form.getByLabel('Site').selectOption({ label: 'Sunfold Block 12' });
    await form.getByLabel('Spraying starts').fill(`${dayFromNow(3)}T05:30`);
    await form.getByLabel('Spraying ends').fill(`${dayFromNow(3)}T09:00`);
    await form.getByLabel('Product').fill(product);
    await form.getByLabel('Notes').fill('Rows 1 to 40, ground rig.');
    await form.getByRole('button', { name: 'File spray notice' }).click();
    await page.getByText('Spray notice filed.').waitFor();
    await page.getByRole('list', { name: 'Your spray notices' }).getByText(product).waitFor();
    const notices = await e2e.db.query(
      `SELECT status, starts_at FROM spray_notices WHERE product = $1`,
      [product],
    );
    expect(notices).toHaveLength(1);
    expect(notices[0].status).toBe('filed');
    await screenshot(page, 'portal-after');
    await page.close();
  });

  it('when the planner signs in then the contract is agreed and the spray notice is listed to acknowledge', async () => {
    const page = await e2e.newPage();
    await signIn(page, e2e.origin, 'planner@demo.test');
    await page.goto(`${e2e.origin}/contracts/${contractId}`);
    await page.getByText('Agreed').first().waitFor();

    await page.goto(`${e2e.origin}/spray-notices`);
    const notice = page.locator(`[data-notice="${product}"]`);
    await notice.waitFor();
    expect(await notice.innerText()).toContain('Sunfold Block 12');
    await page
      .getByRole('button', { name: /Notifications/ })
      .first()
      .click();
    await screenshot(page, 'spray-notices-staff');

    await notice.getByLabel('Action').selectOption('cover');
    await notice.getByLabel('Internal note').fill('Cover with wet burlap the night before.');
    await notice.getByRole('button', { name: 'Acknowledge' }).click();
    await notice.getByText('Colonies covered').waitFor();
    const [row] = await e2e.db.query(
      `SELECT status, action FROM spray_notices WHERE product = $1`,
      [product],
    );
    expect(row).toMatchObject({ status: 'acknowledged', action: 'cover' });
    await page.setViewportSize({ width: 390, height: 844 });
    await screenshot(page, 'spray-notices-staff-phone');

    // Nothing the browser asked for left the host.
    expect(e2e.requests.every((url) => url.startsWith(e2e.origin))).toBe(true);
    await page.close();
  });
});

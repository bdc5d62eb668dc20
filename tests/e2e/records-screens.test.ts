import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { request, type Page } from 'playwright-core';
import { screenshot, signIn, startE2e, type E2e } from './support/e2e-app';

let e2e: E2e;

beforeAll(async () => {
  e2e = await startE2e();
});
afterAll(() => e2e?.close());

/** The yard page's own count line, e.g. "117 colonies of 400 capacity". */
const colonyLine = async (page: Page) =>
  (await page.locator('main').innerText()).match(/([\d,]+) colonies of [\d,]+ capacity/)?.[1];

describe('records screens in the browser', () => {
  it('when the planner adds a yard and records a purchase and a loss then the count follows the ledger', async () => {
    const page = await e2e.newPage();
    await signIn(page, e2e.origin, 'planner@demo.test');
    await page.goto(`${e2e.origin}/yards/new`);
    await page.getByLabel('Yard name', { exact: true }).fill('Mesquite Corner');
    await page.getByLabel('Latitude', { exact: true }).fill('28.31');
    await page.getByLabel('Longitude', { exact: true }).fill('-98.12');
    await page.getByLabel('Capacity (colonies)', { exact: true }).fill('300');
    await page.getByRole('button', { name: 'Add yard' }).click();
    await page.getByRole('heading', { name: 'Mesquite Corner', exact: true }).waitFor();
    expect(await colonyLine(page)).toBe('0');

    for (const [kind, colonies] of [
      ['purchase', '48'],
      ['loss', '5'],
    ]) {
      await page.getByRole('button', { name: 'Record entry' }).click();
      const form = page.getByRole('form', { name: 'Record a ledger entry' });
      await form.getByLabel('What happened', { exact: true }).selectOption(kind);
      await form.getByLabel('Number of colonies', { exact: true }).fill(colonies);
      await form
        .getByLabel('Reason', { exact: true })
        .fill(kind === 'loss' ? 'five dead-outs after the freeze' : 'bought from a neighbour');
      await form.getByRole('button', { name: 'Record entry' }).click();
      await form.waitFor({ state: 'detached' });
    }
    await page.waitForFunction(() =>
      /43 colonies of 300 capacity/.test(document.querySelector('main')?.textContent ?? ''),
    );
    const [row] = await e2e.db.query(
      `SELECT count(*)::int AS n FROM ledger_entries l JOIN yards y ON y.id = l.to_id OR y.id = l.from_id WHERE y.name = 'Mesquite Corner'`,
    );
    expect(row.n).toBe(2);
    await screenshot(page, 'yard-detail-after-loss');
    await page.close();
  });

  it('when the planner creates a contract then it is saved and listed', async () => {
    const page = await e2e.newPage();
    await signIn(page, e2e.origin, 'planner@demo.test');
    await page.goto(`${e2e.origin}/contracts/new`);
    const form = page.getByRole('form', { name: 'Add a contract' });
    const [grower] = await e2e.db.query(
      `SELECT g.id, g.name FROM growers g JOIN operations o ON o.id = g.operation_id WHERE o.name = 'Mesquite Flats Apiaries' ORDER BY g.name LIMIT 1`,
    );
    await form.getByLabel('Grower', { exact: true }).selectOption(grower.id);
    await form.getByLabel('Crop', { exact: true }).selectOption('cherry');
    await form.getByLabel('Season (year)', { exact: true }).fill('2027');
    await form.getByLabel('Colonies ordered', { exact: true }).fill('120');
    await form.getByLabel('Minimum frames of bees', { exact: true }).fill('6');
    await form.getByLabel('Fee per colony ($)', { exact: true }).fill('72.50');
    await form.getByLabel('Delivery from', { exact: true }).fill('2027-04-01');
    await form.getByLabel('Delivery by', { exact: true }).fill('2027-04-05');
    await form.getByRole('button', { name: 'Add contract' }).click();
    await page.waitForURL(/\/contracts\/[0-9a-f-]{36}$/);
    const [saved] = await e2e.db.query(
      `SELECT colonies_ordered, fee_per_colony_cents, status FROM contracts WHERE grower_id = $1 AND crop = 'cherry' AND season = 2027 AND colonies_ordered = 120`,
      [grower.id],
    );
    expect(saved).toEqual({ colonies_ordered: 120, fee_per_colony_cents: 7250, status: 'draft' });
    await screenshot(page, 'contract-detail');
    await page.goto(`${e2e.origin}/contracts`);
    await page.getByRole('table').waitFor();
    await screenshot(page, 'contracts-list');
    await page.close();
  });

  it('when crew go through every screen they can reach then no fee or amount appears', async () => {
    const page = await e2e.newPage();
    await signIn(page, e2e.origin, 'crew@demo.test');
    const [yard] = await e2e.db.query(
      `SELECT y.id FROM yards y JOIN operations o ON o.id = y.operation_id WHERE o.name = 'Mesquite Flats Apiaries' LIMIT 1`,
    );
    const [contract] = await e2e.db.query(
      `SELECT c.id FROM contracts c JOIN operations o ON o.id = c.operation_id WHERE o.name = 'Mesquite Flats Apiaries' AND c.fee_per_colony_cents > 0 LIMIT 1`,
    );
    const nav = await page.getByRole('navigation').first().innerText();
    for (const path of [
      '/yards',
      `/yards/${yard.id}`,
      '/contracts',
      `/contracts/${contract.id}`,
      '/settings',
    ]) {
      await page.goto(`${e2e.origin}${path}`);
      await page.locator('main h1').first().waitFor();
      await page.waitForLoadState('networkidle');
      const text = await page.locator('body').innerText();
      expect({ path, dollars: /\$\s?\d/.test(text), fee: /\bfee\b|deposit/i.test(text) }).toEqual({
        path,
        dollars: false,
        fee: false,
      });
    }
    expect(nav).not.toMatch(/Settings.*People|Fleet/);
    await screenshot(page, 'crew-contract-without-fees');
    await page.close();
  });

  it('when the owner invites then deactivates a person then that person is refused', async () => {
    const page = await e2e.newPage();
    await signIn(page, e2e.origin, 'owner@demo.test');
    await page.goto(`${e2e.origin}/settings/people`);
    await page.getByRole('button', { name: 'Invite person' }).click();
    const form = page.getByRole('form', { name: 'Invite a person' });
    await form.getByLabel('Name', { exact: true }).fill('Temporary Hand');
    await form.getByLabel('E-mail', { exact: true }).fill('temp.hand@demo.test');
    await form.getByLabel('Role', { exact: true }).selectOption('crew');
    await form.getByLabel('First password', { exact: true }).fill('a-long-first-passphrase');
    await form.getByRole('button', { name: 'Invite' }).click();
    const row = page.getByRole('row').filter({ hasText: 'temp.hand@demo.test' });
    await row.waitFor();
    await screenshot(page, 'settings-people');

    // The new person signs in once, in their own page, then the owner deactivates them.
    // A cookie jar of their own, apart from the owner's browser profile.
    const hand = await request.newContext();
    const response = await hand.get(`${e2e.origin}/api/session`);
    const { csrfToken } = await response.json();
    const signedIn = await hand.post(`${e2e.origin}/api/session`, {
      headers: { 'X-CSRF-Token': csrfToken },
      data: { email: 'temp.hand@demo.test', password: 'a-long-first-passphrase' },
    });
    expect(signedIn.status()).toBe(200);

    await row.getByRole('button', { name: 'Deactivate' }).click();
    await row.getByText('Deactivated', { exact: true }).waitFor();
    // The badge turns at once (optimistic); the server's answer follows.
    await expect
      .poll(
        async () =>
          (await e2e.db.query(`SELECT active FROM users WHERE email = 'temp.hand@demo.test'`))[0]
            .active,
      )
      .toBe(false);
    const stale = await hand.get(`${e2e.origin}/api/yards`);
    expect(stale.status()).toBe(401);
    // The owner's page may still have a request in flight whose answer renews the session
    // cookie; close it and let it settle before clearing cookies, or the owner stays signed in.
    await page.waitForLoadState('networkidle');
    await page.close();
    await e2e.browser.clearCookies();
    const signInPage = await e2e.newPage();
    await signInPage.goto(`${e2e.origin}/sign-in`);
    await signInPage.getByLabel(/e-?mail/i).fill('temp.hand@demo.test');
    await signInPage.getByLabel(/password/i).fill('a-long-first-passphrase');
    await signInPage.getByRole('button', { name: /sign in/i }).click();
    await signInPage.getByText('Wrong e-mail or password.').waitFor();
    expect(signInPage.url()).toContain('/sign-in');
    await hand.dispose();
    await signInPage.close();
  });

  it('when the app is 390 px wide then every main screen fits without sideways scrolling', async () => {
    const page = await e2e.newPage({ width: 390, height: 844 });
    await signIn(page, e2e.origin, 'planner@demo.test');
    const [site] = await e2e.db.query(
      `SELECT s.id FROM sites s JOIN operations o ON o.id = s.operation_id WHERE o.name = 'Mesquite Flats Apiaries' AND s.boundary IS NOT NULL LIMIT 1`,
    );
    for (const [name, path] of [
      ['yards', '/yards'],
      ['sites', '/sites'],
      ['site', `/sites/${site.id}`],
      ['growers', '/growers'],
      ['contracts', '/contracts'],
      ['settings', '/settings/fleet'],
    ]) {
      await page.goto(`${e2e.origin}${path}`);
      await page.locator('main h1').first().waitFor();
      await page.waitForLoadState('networkidle');
      const overflow = await page.evaluate(
        () => document.documentElement.scrollWidth - window.innerWidth,
      );
      expect({ name, overflow }).toEqual({ name, overflow: 0 });
      await screenshot(page, `phone-${name}`);
    }
    await page.getByRole('button', { name: /menu/i }).click();
    await page.getByRole('link', { name: 'Sites' }).waitFor();
    await page.close();
  });
});

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakePayments, type FakePayments } from '../../scripts/fake-payments';
import { freePort, screenshot, signIn, startE2e, type E2e } from './support/e2e-app';

let e2e: E2e;
let fake: FakePayments;
let invoiceId = '';
const webhookSecret = 'whsec_e2e_invoices_0123456789';

beforeAll(async () => {
  fake = await startFakePayments({ port: 0, webhookSecret });
  // The checkout return addresses are built from APP_URL, so the app's port is chosen first.
  const port = await freePort();
  e2e = await startE2e({
    port,
    env: {
      APP_URL: `http://127.0.0.1:${port}`,
      PAYMENTS_SECRET_KEY: 'sk_test_e2e_invoices',
      PAYMENTS_WEBHOOK_SECRET: webhookSecret,
      PAYMENTS_API_HOST: '127.0.0.1',
      PAYMENTS_API_PORT: String(fake.port),
      PAYMENTS_API_PROTOCOL: 'http',
    },
  });
  fake.setWebhookUrl(`${e2e.origin}/api/payments/webhook`);
});
afterAll(async () => {
  await e2e?.close();
  await fake?.stop();
});

describe('invoices in the browser', () => {
  it('when the owner bills the Sunfold almond deposit and issues it then it is sent with a due date', async () => {
    const [contract] = await e2e.db.query(
      `SELECT c.id, g.name FROM contracts c JOIN growers g ON g.id = c.grower_id
        WHERE g.name ILIKE 'Sunfold%' AND c.crop = 'almond' AND c.season = 2027 AND c.status = 'agreed'`,
    );
    expect(contract).toBeTruthy();
    const page = await e2e.newPage();
    await signIn(page, e2e.origin, 'owner@demo.test');
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Invoices' })
      .click();
    await page.waitForURL(/\/invoices$/);
    await page.getByRole('button', { name: 'Bill a contract' }).first().click();
    const form = page.getByRole('form', { name: 'Bill a contract' });
    const contractSelect = form.getByLabel('Contract');
    const option = contractSelect.locator('option', { hasText: `${contract.name}: Almond 2027` });
    await contractSelect.selectOption((await option.first().getAttribute('value'))!);
    await form.getByLabel('Deposit').check();
    await screenshot(page, 'invoice-bill-contract');
    await form.getByRole('button', { name: 'Create draft invoice' }).click();
    await page.waitForURL(/\/invoices\/[0-9a-f-]{36}$/);
    invoiceId = page.url().split('/').pop()!;
    await page
      .getByRole('heading', { name: /^Invoice \d+: Almond pollination deposit, 2027$/ })
      .waitFor();
    expect(await page.getByTestId('invoice-status').innerText()).toBe('Draft');
    expect(await page.getByTestId('invoice-total').innerText()).toBe('$32,000.00');

    await page.getByRole('button', { name: 'Issue invoice' }).click();
    const issue = page.getByRole('form', { name: 'Issue invoice' });
    await issue.getByLabel('Due date').fill('2027-01-10');
    await issue.getByRole('button', { name: 'Issue and e-mail' }).click();
    await expect
      .poll(() => page.getByTestId('invoice-status').innerText())
      .toBe('Awaiting payment');
    const [row] = await e2e.db.query(`SELECT status, due_on::text FROM invoices WHERE id = $1`, [
      invoiceId,
    ]);
    expect(row).toMatchObject({ status: 'sent', due_on: '2027-01-10' });
    await screenshot(page, 'invoice-owner-sent');

    await page.goto(`${e2e.origin}/invoices/${invoiceId}/print`);
    await page.getByRole('article', { name: /Invoice \d+/ }).waitFor();
    await screenshot(page, 'invoice-print');
    await page.close();
  });

  it('when a planner opens the invoice then there are no owner actions', async () => {
    expect(invoiceId).not.toBe('');
    const page = await e2e.newPage();
    await signIn(page, e2e.origin, 'planner@demo.test');
    await page.goto(`${e2e.origin}/invoices/${invoiceId}`);
    await page.getByTestId('invoice-status').waitFor();
    expect(await page.getByTestId('invoice-status').innerText()).toBe('Awaiting payment');
    expect(await page.getByRole('button', { name: 'Void' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Pay online' }).count()).toBe(0);
    await page.close();
  });

  it('when the grower pays online through the fake provider then they see the thanks and the invoice is paid', async () => {
    expect(invoiceId).not.toBe('');
    const page = await e2e.newPage();
    await signIn(page, e2e.origin, 'grower@demo.test');
    await page.goto(`${e2e.origin}/invoices/${invoiceId}`);
    await page.getByRole('button', { name: 'Pay online' }).waitFor();
    await screenshot(page, 'invoice-grower-pay');
    await page.getByRole('button', { name: 'Pay online' }).click();
    await page.waitForURL((url) => url.origin === fake.url);
    await screenshot(page, 'invoice-fake-checkout');
    await page.getByRole('button', { name: 'Pay', exact: true }).click();
    await page.waitForURL(
      (url) => url.origin === e2e.origin && url.search.includes('payment=complete'),
    );
    await page.getByText('Payment received — thank you').waitFor({ timeout: 20_000 });
    await screenshot(page, 'invoice-grower-paid');
    await page.close();

    await expect
      .poll(async () => {
        const [row] = await e2e.db.query(`SELECT status FROM invoices WHERE id = $1`, [invoiceId]);
        return row.status;
      })
      .toBe('paid');
    const owner = await e2e.newPage();
    await signIn(owner, e2e.origin, 'owner@demo.test');
    await owner.goto(`${e2e.origin}/invoices/${invoiceId}`);
    await owner.getByTestId('invoice-status').waitFor();
    expect(await owner.getByTestId('invoice-status').innerText()).toBe('Paid');
    expect(await owner.getByTestId('invoice-owed').innerText()).toBe('$0.00');
    await owner.goto(`${e2e.origin}/receivables`);
    await owner.getByRole('heading', { name: 'Receivables' }).waitFor();
    await screenshot(owner, 'receivables');
    await owner.close();
  });
});

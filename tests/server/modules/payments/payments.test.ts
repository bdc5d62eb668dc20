import { randomBytes } from 'node:crypto';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInClient, type Client } from '../../../support/test-app';
import { createCrew, testPassword } from '../../../support/factories';
import { startMailTestApp, supertest, type MailTestApp } from '../emails/support';
import { billingFixtures } from '../invoices/billing-fixtures';
import {
  signPayload,
  startFakePayments,
  type FakePayments,
  type FakeSession,
} from '../../../../scripts/fake-payments';

const apiKey = `sk_test_${randomBytes(8).toString('hex')}`;
const webhookSecret = `whsec_${randomBytes(16).toString('hex')}`;

let fake: FakePayments;
let t: MailTestApp;
let server: Server;
let people: Awaited<ReturnType<typeof createCrew>>;
let c: Record<'owner' | 'planner' | 'crew' | 'growerA' | 'growerB', Client>;
let f: ReturnType<typeof billingFixtures>;

beforeAll(async () => {
  fake = await startFakePayments({ webhookSecret, apiKey });
  t = await startMailTestApp({
    PAYMENTS_SECRET_KEY: apiKey,
    PAYMENTS_WEBHOOK_SECRET: webhookSecret,
    PAYMENTS_API_HOST: '127.0.0.1',
    PAYMENTS_API_PORT: String(fake.port),
    PAYMENTS_API_PROTOCOL: 'http',
  });
  // The fake delivers webhooks over real HTTP, so the app listens on a loopback port too.
  server = createServer(t.app);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', () => resolve()));
  fake.setWebhookUrl(
    `http://127.0.0.1:${(server.address() as AddressInfo).port}/api/payments/webhook`,
  );
  people = await createCrew(t.db);
  f = billingFixtures(t.db, people.operationId);
  c = {
    owner: await signedInClient(t.app, people.owner.email, testPassword),
    planner: await signedInClient(t.app, people.planner.email, testPassword),
    crew: await signedInClient(t.app, people.crew.email, testPassword),
    growerA: await signedInClient(t.app, people.growerUserA.email, testPassword),
    growerB: await signedInClient(t.app, people.growerUserB.email, testPassword),
  };
}, 60_000);
afterAll(async () => {
  await new Promise<void>((resolve) => server?.close(() => resolve()));
  await t?.close();
  await fake?.stop();
});

/** A sent deposit invoice of grower A for `cents`. */
async function sentInvoice(cents = 480_000) {
  const contractId = await f.contract({
    growerId: people.growerA,
    feePerColonyCents: 19_000,
    depositCents: cents,
  });
  const draft = (await c.owner.post('/api/invoices', { contractId, kind: 'deposit' })).body;
  const sent = await c.owner.post(`/api/invoices/${draft.id}/issue`, { version: draft.version });
  expect(sent.status).toBe(200);
  return sent.body as { id: string; number: number; version: number; amountCents: number };
}

/** What the database holds about an invoice's money. */
async function ledgerOf(invoiceId: string) {
  const [invoice] = await t.db.query(
    `SELECT status, version, paid_at FROM invoices WHERE id = $1`,
    [invoiceId],
  );
  const payments = await t.db.query(
    `SELECT amount_cents, provider_reference FROM payments WHERE invoice_id = $1`,
    [invoiceId],
  );
  const events = await t.db.query(
    `SELECT e.type, e.outcome FROM payment_events e
       JOIN checkout_sessions s ON s.provider_session_id = e.provider_session_id
      WHERE s.invoice_id = $1 ORDER BY e.received_at`,
    [invoiceId],
  );
  return { invoice, payments, events };
}

/** "Clicks" a button on the fake's hosted checkout page by posting its form, as a browser would. */
async function press(checkoutUrl: string, button: 'Pay' | 'Cancel') {
  const page = await fetch(checkoutUrl);
  expect(page.status).toBe(200);
  const html = await page.text();
  const forms = [
    ...html.matchAll(
      /<form method="post" action="([^"]+)"><button type="submit">([^<]+)<\/button>/g,
    ),
  ];
  const action = forms.find((m) => m[2] === button)?.[1];
  expect(action, `a "${button}" form on the page`).toBeTruthy();
  return fetch(new URL(action as string, checkoutUrl), { method: 'POST', redirect: 'manual' });
}

const sessionOf = (checkoutUrl: string) =>
  fake.sessions.get(checkoutUrl.split('/').pop() as string) as FakeSession;

describe('payment round trip through the fake provider', () => {
  it('when grower A pays a sent invoice on the hosted page then the signed webhook marks it paid', async () => {
    const invoice = await sentInvoice(480_000);
    const started = await c.growerA.post(`/api/invoices/${invoice.id}/checkout`, {});
    expect(started.status, JSON.stringify(started.body)).toBe(201);
    expect(started.body.checkoutUrl.startsWith(`${fake.url}/pay/`)).toBe(true);
    expect(started.body.amountCents).toBe(480_000);

    // The SDK created the session on the fake with what the provider needs.
    const session = sessionOf(started.body.checkoutUrl);
    expect(session).toMatchObject({
      status: 'open',
      amount_total: 480_000,
      currency: 'usd',
      client_reference_id: invoice.id,
      metadata: { invoiceId: invoice.id, operationId: people.operationId },
      success_url: `http://duskhaul.test/invoices/${invoice.id}?payment=complete&session={CHECKOUT_SESSION_ID}`,
      cancel_url: `http://duskhaul.test/invoices/${invoice.id}?payment=cancelled`,
    });
    // Asking again while it is open hands out the same page, not a second one to pay twice.
    const again = await c.owner.post(`/api/invoices/${invoice.id}/checkout`, {});
    expect(again.body.checkoutUrl).toBe(started.body.checkoutUrl);

    const paid = await press(started.body.checkoutUrl, 'Pay');
    expect(paid.status).toBe(303);
    expect(paid.headers.get('location')).toBe(
      `http://duskhaul.test/invoices/${invoice.id}?payment=complete&session=${session.id}`,
    );
    const delivery = fake.deliveries.at(-1);
    expect(delivery).toMatchObject({ type: 'checkout.session.completed', status: 200 });

    const seen = await c.growerA.get(`/api/invoices/${invoice.id}`);
    expect(seen.body).toMatchObject({ status: 'paid', paidCents: 480_000, outstandingCents: 0 });
    expect(seen.body.paidAt).toBeTruthy();
    expect(seen.body.payments).toHaveLength(1);
    expect(seen.body.payments[0].providerReference).toBeUndefined();
    const owner = await c.owner.get(`/api/invoices/${invoice.id}`);
    expect(owner.body.payments[0].providerReference).toBe(session.payment_intent);
    expect((await ledgerOf(invoice.id)).events).toEqual([
      { type: 'checkout.session.completed', outcome: 'paid' },
    ]);

    // Nothing left to pay.
    expect((await c.growerA.post(`/api/invoices/${invoice.id}/checkout`, {})).status).toBe(409);
  });

  it('when the same event is delivered twice (and a second event repeats the payment) then it is applied once', async () => {
    const invoice = await sentInvoice(125_075);
    const started = (await c.growerA.post(`/api/invoices/${invoice.id}/checkout`, {})).body;
    await press(started.checkoutUrl, 'Pay');
    const completed = fake.events.at(-1)!;
    const after = await ledgerOf(invoice.id);
    expect(after.invoice.status).toBe('paid');

    const redelivered = await fake.redeliver(completed.id);
    expect(redelivered.status).toBe(200);
    expect(JSON.parse(redelivered.responseBody)).toEqual({ received: true, outcome: 'duplicate' });
    // A different event id about the same payment (the provider may send both kinds).
    const twin = await fake.deliver('checkout.session.completed', completed.data.object);
    expect(JSON.parse(twin.responseBody).outcome).toBe('payment-already-recorded');

    const final = await ledgerOf(invoice.id);
    expect(final.payments).toEqual([
      { amount_cents: 125_075, provider_reference: completed.data.object.payment_intent },
    ]);
    expect(final.invoice).toEqual(after.invoice);
  });

  it('when ten copies of one event arrive at once then exactly one payment is recorded', async () => {
    const invoice = await sentInvoice(99_900);
    const started = (await c.growerA.post(`/api/invoices/${invoice.id}/checkout`, {})).body;
    const session = {
      ...sessionOf(started.checkoutUrl),
      status: 'complete' as const,
      payment_status: 'paid' as const,
      payment_intent: `pi_parallel_${invoice.id}`,
    };
    const event = JSON.stringify({
      id: `evt_parallel_${invoice.id}`,
      object: 'event',
      created: Math.floor(Date.now() / 1000),
      type: 'checkout.session.completed',
      data: { object: session },
    });
    const responses = await Promise.all(
      Array.from({ length: 10 }, () =>
        supertest(t.app)
          .post('/api/payments/webhook')
          .set('Content-Type', 'application/json')
          .set('Stripe-Signature', signPayload(event, webhookSecret))
          .send(event),
      ),
    );
    expect(responses.map((r) => r.status)).toEqual(Array(10).fill(200));
    expect(responses.filter((r) => r.body.outcome === 'paid')).toHaveLength(1);
    expect((await ledgerOf(invoice.id)).payments).toHaveLength(1);
  });

  it('when a replayed older expiry arrives after the payment then the invoice stays paid', async () => {
    const invoice = await sentInvoice(50_000);
    const started = (await c.growerA.post(`/api/invoices/${invoice.id}/checkout`, {})).body;
    const openSnapshot = structuredClone(sessionOf(started.checkoutUrl));
    await press(started.checkoutUrl, 'Pay');
    const older = Math.floor(Date.now() / 1000) - 3600;
    const stale = await fake.deliver(
      'checkout.session.expired',
      { ...openSnapshot, status: 'expired' },
      older,
    );
    expect(JSON.parse(stale.responseBody).outcome).toBe('stale');
    const { invoice: row, payments } = await ledgerOf(invoice.id);
    expect(row.status).toBe('paid');
    expect(payments).toHaveLength(1);
  });

  it('when the grower cancels on the hosted page then the session expires and the invoice stays unpaid', async () => {
    const invoice = await sentInvoice(70_000);
    const started = (await c.growerA.post(`/api/invoices/${invoice.id}/checkout`, {})).body;
    const cancelled = await press(started.checkoutUrl, 'Cancel');
    expect(cancelled.status).toBe(303);
    expect(cancelled.headers.get('location')).toBe(
      `http://duskhaul.test/invoices/${invoice.id}?payment=cancelled`,
    );
    expect(fake.deliveries.at(-1)).toMatchObject({ type: 'checkout.session.expired', status: 200 });

    const { invoice: row, payments, events } = await ledgerOf(invoice.id);
    expect(row.status).toBe('sent');
    expect(payments).toEqual([]);
    expect(events).toEqual([{ type: 'checkout.session.expired', outcome: 'expired' }]);
    // Trying again opens a new page.
    const retry = await c.growerA.post(`/api/invoices/${invoice.id}/checkout`, {});
    expect(retry.status).toBe(201);
    expect(retry.body.checkoutUrl).not.toBe(started.checkoutUrl);
  });
});

describe('POST /api/payments/webhook', () => {
  it('when the signature is forged, missing or covers other bytes then 400 and nothing changes', async () => {
    const invoice = await sentInvoice(60_000);
    const started = (await c.growerA.post(`/api/invoices/${invoice.id}/checkout`, {})).body;
    const session = {
      ...sessionOf(started.checkoutUrl),
      status: 'complete',
      payment_status: 'paid',
      payment_intent: `pi_forged_${invoice.id}`,
    };
    const event = JSON.stringify({
      id: `evt_forged_${invoice.id}`,
      object: 'event',
      created: Math.floor(Date.now() / 1000),
      type: 'checkout.session.completed',
      data: { object: session },
    });
    const before = await ledgerOf(invoice.id);
    const send = (signature: string | null, body = event) => {
      const request = supertest(t.app)
        .post('/api/payments/webhook')
        .set('Content-Type', 'application/json');
      return (signature ? request.set('Stripe-Signature', signature) : request).send(body);
    };
    const forged = await send(signPayload(event, 'whsec_someone_elses_secret'));
    expect(forged.status).toBe(400);
    expect(forged.body.error.code).toBe('bad_request');
    expect((await send(null)).status).toBe(400);
    const otherBytes = event.replace('60000', '6');
    expect((await send(signPayload(event, webhookSecret), otherBytes)).status).toBe(400);
    const tooOld = await send(
      signPayload(event, webhookSecret, Math.floor(Date.now() / 1000) - 3600),
    );
    expect(tooOld.status).toBe(400);
    expect(await ledgerOf(invoice.id)).toEqual(before);
    const [{ n }] = await t.db.query(
      `SELECT count(*)::int AS n FROM payment_events WHERE provider_event_id = $1`,
      [`evt_forged_${invoice.id}`],
    );
    expect(n).toBe(0);
  });

  it('when a signed event is about a session we never opened then it is acknowledged and changes nothing', async () => {
    const session = {
      id: 'cs_test_not_ours',
      object: 'checkout.session',
      status: 'complete',
      payment_status: 'paid',
      amount_total: 100,
      metadata: {},
    };
    const event = JSON.stringify({
      id: `evt_unknown_${Date.now()}`,
      object: 'event',
      created: Math.floor(Date.now() / 1000),
      type: 'checkout.session.completed',
      data: { object: session },
    });
    const response = await supertest(t.app)
      .post('/api/payments/webhook')
      .set('Content-Type', 'application/json')
      .set('Stripe-Signature', signPayload(event, webhookSecret))
      .send(event);
    expect(response.status).toBe(200);
    expect(response.body.outcome).toBe('unknown-session');
    const [{ n }] = await t.db.query(
      `SELECT count(*)::int AS n FROM payments WHERE provider_session_id = 'cs_test_not_ours'`,
    );
    expect(n).toBe(0);
  });
});

describe('POST /api/invoices/:id/checkout', () => {
  it('when grower B, crew or a planner asks to pay grower A’s invoice then 404 / 403 and no session is opened', async () => {
    const invoice = await sentInvoice(40_000);
    const sessionsBefore = fake.sessions.size;
    expect((await c.growerB.post(`/api/invoices/${invoice.id}/checkout`, {})).status).toBe(404);
    expect((await c.crew.post(`/api/invoices/${invoice.id}/checkout`, {})).status).toBe(403);
    expect((await c.planner.post(`/api/invoices/${invoice.id}/checkout`, {})).status).toBe(403);
    expect(
      (await c.growerA.post(`/api/invoices/${invoice.id}/checkout`, { amountCents: 1 })).status,
    ).toBe(400);
    expect(fake.sessions.size).toBe(sessionsBefore);
  });

  it('when the owner voids an invoice with an open checkout then the provider expires that session', async () => {
    const invoice = await sentInvoice(30_000);
    const started = (await c.growerA.post(`/api/invoices/${invoice.id}/checkout`, {})).body;
    const fresh = (await c.owner.get(`/api/invoices/${invoice.id}`)).body;
    const voided = await c.owner.post(`/api/invoices/${invoice.id}/void`, {
      version: fresh.version,
    });
    expect(voided.status).toBe(200);
    expect(sessionOf(started.checkoutUrl).status).toBe('expired');
    const [row] = await t.db.query(
      `SELECT status FROM checkout_sessions WHERE provider_session_id = $1`,
      [started.sessionId],
    );
    expect(row.status).toBe('expired');
    expect((await press(started.checkoutUrl, 'Pay').catch(() => null))?.status ?? 409).toBe(409);
  });
});

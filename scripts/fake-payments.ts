import { createHmac, randomBytes } from 'node:crypto';
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { pathToFileURL } from 'node:url';

/**
 * A local stand-in for the hosted-payments provider (Stripe's API, the parts we call), on
 * loopback only. Nothing leaves the machine.
 *
 *   POST /v1/checkout/sessions              create a session (form-encoded, as the SDK sends)
 *   GET  /v1/checkout/sessions/:id          read it back
 *   POST /v1/checkout/sessions/:id/expire   expire an open session
 *   GET  /pay/:id                           the hosted checkout page: "Pay" and "Cancel"
 *   POST /pay/:id/complete                  pay: session complete + paid, webhook, back to success_url
 *   POST /pay/:id/cancel                    abandon: session expired, webhook, back to cancel_url
 *   GET  /health                            readiness
 *
 * Webhooks are signed like the provider signs them: header
 * `Stripe-Signature: t=<unix seconds>,v1=<hex HMAC-SHA256 of "<t>.<body>" under the secret>`.
 * A real abandoned session expires after 24 hours; here "Cancel" expires it at once, so the
 * `checkout.session.expired` path can be tried locally.
 */

export interface FakeSession {
  id: string;
  object: 'checkout.session';
  mode: string;
  status: 'open' | 'complete' | 'expired';
  payment_status: 'unpaid' | 'paid';
  payment_intent: string | null;
  amount_subtotal: number;
  amount_total: number;
  currency: string;
  url: string | null;
  success_url: string | null;
  cancel_url: string | null;
  client_reference_id: string | null;
  customer_email: string | null;
  metadata: Record<string, string>;
  created: number;
  expires_at: number;
  livemode: false;
  /** Kept for the checkout page; the real object only has it when expanded. */
  line_items: { data: Array<{ description: string; amount_total: number; quantity: number }> };
}

export interface FakeEvent {
  id: string;
  object: 'event';
  api_version: string;
  created: number;
  type: string;
  data: { object: FakeSession };
  livemode: false;
  pending_webhooks: number;
  request: { id: null; idempotency_key: null };
}

/** One attempt to hand an event to the app. */
export interface Delivery {
  eventId: string;
  type: string;
  /** HTTP status the app answered, or 0 when it could not be reached. */
  status: number;
  responseBody: string;
}

export interface FakePayments {
  port: number;
  /** Base URL, e.g. http://127.0.0.1:12111. */
  url: string;
  sessions: Map<string, FakeSession>;
  events: FakeEvent[];
  deliveries: Delivery[];
  setWebhookUrl(url: string): void;
  /** Delivers an event already sent once more, freshly signed (a provider retry). */
  redeliver(eventId: string): Promise<Delivery>;
  /** Builds, signs and delivers an event about a session (tests: replays, out-of-order). */
  deliver(type: string, session: FakeSession, created?: number): Promise<Delivery>;
  stop(): Promise<void>;
}

export interface FakePaymentsOptions {
  port?: number;
  /** Where events are POSTed (the app's /api/payments/webhook). */
  webhookUrl?: string;
  /** The endpoint's signing secret, shared with the app. */
  webhookSecret: string;
  /** The secret key the app must present; any `sk_…` key when not given. */
  apiKey?: string;
}

const host = '127.0.0.1';
const apiVersion = '2026-10-28.endive';
const newId = (prefix: string) => `${prefix}_${randomBytes(12).toString('hex')}`;
const now = () => Math.floor(Date.now() / 1000);

/** The `Stripe-Signature` header value for a payload. */
export function signPayload(payload: string, secret: string, timestamp = now()): string {
  const signature = createHmac('sha256', secret).update(`${timestamp}.${payload}`).digest('hex');
  return `t=${timestamp},v1=${signature}`;
}

/** Starts the fake on loopback; port 0 picks a free port (tests). */
export async function startFakePayments(options: FakePaymentsOptions): Promise<FakePayments> {
  const sessions = new Map<string, FakeSession>();
  const events: FakeEvent[] = [];
  const deliveries: Delivery[] = [];
  const idempotent = new Map<string, FakeSession>();
  let webhookUrl = options.webhookUrl ?? '';
  let base = '';

  const post = async (event: FakeEvent): Promise<Delivery> => {
    const payload = JSON.stringify(event, null, 2);
    let delivery: Delivery = { eventId: event.id, type: event.type, status: 0, responseBody: '' };
    // The provider retries failed deliveries for days; three quick tries is enough locally.
    for (let attempt = 0; attempt < 3; attempt++) {
      try {
        const response = await fetch(webhookUrl, {
          method: 'POST',
          headers: {
            'Content-Type': 'application/json; charset=utf-8',
            'Stripe-Signature': signPayload(payload, options.webhookSecret),
            'User-Agent': 'Stripe/1.0 (+https://stripe.com/docs/webhooks) duskhaul-fake',
          },
          body: payload,
          signal: AbortSignal.timeout(10_000),
        });
        delivery = { ...delivery, status: response.status, responseBody: await response.text() };
        if (response.status < 500) break;
      } catch (error) {
        delivery = { ...delivery, status: 0, responseBody: String(error) };
      }
      await new Promise((r) => setTimeout(r, 200 * (attempt + 1)));
    }
    deliveries.push(delivery);
    return delivery;
  };

  const deliver = (type: string, session: FakeSession, created = now()) => {
    const event: FakeEvent = {
      id: newId('evt'),
      object: 'event',
      api_version: apiVersion,
      created,
      type,
      data: { object: structuredClone(session) },
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
    };
    events.push(event);
    return post(event);
  };

  const complete = (session: FakeSession) => {
    session.status = 'complete';
    session.payment_status = 'paid';
    session.payment_intent = newId('pi');
    session.url = null;
    return deliver('checkout.session.completed', session);
  };
  const expire = (session: FakeSession) => {
    session.status = 'expired';
    session.url = null;
    return deliver('checkout.session.expired', session);
  };

  const server: Server = createServer((req, res) => {
    handle(req, res).catch((error) => {
      if (!res.headersSent) sendJson(res, 500, apiError(String(error)));
    });
  });

  async function handle(req: IncomingMessage, res: ServerResponse) {
    const url = new URL(req.url ?? '/', base);
    const path = url.pathname;
    if (req.method === 'GET' && path === '/health') return sendText(res, 200, 'ok');

    if (path.startsWith('/v1/')) {
      const key = /^Bearer (.+)$/.exec(req.headers.authorization ?? '')?.[1];
      if (!key || (options.apiKey ? key !== options.apiKey : !key.startsWith('sk_')))
        return sendJson(res, 401, apiError('Invalid API Key provided.', 'authentication_error'));
      if (req.method === 'POST' && path === '/v1/checkout/sessions') {
        const replayKey = req.headers['idempotency-key'];
        const body = parseForm(await readBody(req));
        if (typeof replayKey === 'string' && idempotent.has(replayKey))
          return sendJson(res, 200, idempotent.get(replayKey));
        const created = createSession(body);
        if ('error' in created) return sendJson(res, 400, apiError(created.error));
        sessions.set(created.id, created);
        if (typeof replayKey === 'string') idempotent.set(replayKey, created);
        return sendJson(res, 200, created);
      }
      const match = /^\/v1\/checkout\/sessions\/([^/]+)(\/expire)?$/.exec(path);
      const session = match ? sessions.get(match[1]) : undefined;
      if (!match || !session)
        return sendJson(res, 404, apiError(`No such checkout.session: '${match?.[1] ?? ''}'`));
      if (req.method === 'GET' && !match[2]) return sendJson(res, 200, session);
      if (req.method === 'POST' && match[2]) {
        await readBody(req);
        if (session.status !== 'open')
          return sendJson(res, 400, apiError(`Only open sessions can be expired.`));
        await expire(session);
        return sendJson(res, 200, session);
      }
      return sendJson(res, 404, apiError('Unrecognized request URL.'));
    }

    const page = /^\/pay\/([^/]+)(?:\/(complete|cancel))?$/.exec(path);
    const session = page ? sessions.get(page[1]) : undefined;
    if (!page || !session) return sendText(res, 404, 'No such checkout page.');
    if (req.method === 'GET' && !page[2]) return sendHtml(res, 200, checkoutPage(session));
    if (req.method === 'POST' && page[2]) {
      await readBody(req);
      if (session.status !== 'open') return sendHtml(res, 409, closedPage(session));
      if (page[2] === 'complete') {
        await complete(session);
        return redirect(
          res,
          (session.success_url ?? '/').replace('{CHECKOUT_SESSION_ID}', session.id),
        );
      }
      const cancelUrl = session.cancel_url ?? '/';
      await expire(session);
      return redirect(res, cancelUrl);
    }
    return sendText(res, 405, 'Method not allowed.');
  }

  function createSession(body: Record<string, unknown>): FakeSession | { error: string } {
    const items = Array.isArray(body.line_items) ? body.line_items : [];
    if (items.length === 0) return { error: 'line_items is required in payment mode.' };
    let total = 0;
    let currency = '';
    const lines = [];
    for (const item of items as Array<Record<string, unknown>>) {
      const price = (item.price_data ?? {}) as Record<string, unknown>;
      const product = (price.product_data ?? {}) as Record<string, unknown>;
      const unit = Number(price.unit_amount);
      const quantity = Number(item.quantity ?? 1);
      if (!Number.isInteger(unit) || unit < 0 || !Number.isInteger(quantity) || quantity < 1)
        return { error: 'line_items need a whole unit_amount and quantity.' };
      currency = String(price.currency ?? '');
      total += unit * quantity;
      lines.push({
        description: String(product.name ?? ''),
        amount_total: unit * quantity,
        quantity,
      });
    }
    if (total < 50) return { error: 'The total must be at least 50 cents.' };
    const id = newId('cs_test');
    const created = now();
    return {
      id,
      object: 'checkout.session',
      mode: String(body.mode ?? 'payment'),
      status: 'open',
      payment_status: 'unpaid',
      payment_intent: null,
      amount_subtotal: total,
      amount_total: total,
      currency,
      url: `${base}/pay/${id}`,
      success_url: typeof body.success_url === 'string' ? body.success_url : null,
      cancel_url: typeof body.cancel_url === 'string' ? body.cancel_url : null,
      client_reference_id:
        typeof body.client_reference_id === 'string' ? body.client_reference_id : null,
      customer_email: typeof body.customer_email === 'string' ? body.customer_email : null,
      metadata: (body.metadata ?? {}) as Record<string, string>,
      created,
      expires_at: created + 24 * 3600,
      livemode: false,
      line_items: { data: lines },
    };
  }

  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, host, () => resolve());
  });
  const port = (server.address() as AddressInfo).port;
  base = `http://${host}:${port}`;

  return {
    port,
    url: base,
    sessions,
    events,
    deliveries,
    setWebhookUrl: (url) => (webhookUrl = url),
    redeliver: (eventId) => {
      const event = events.find((e) => e.id === eventId);
      if (!event) throw new Error(`no event ${eventId}`);
      return post(event);
    },
    deliver,
    stop: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}

/** Parses the SDK's form encoding (`a[b][0][c]=v`) into nested objects and arrays. */
export function parseForm(body: string): Record<string, unknown> {
  const root: Record<string, unknown> = {};
  for (const [key, value] of new URLSearchParams(body)) {
    const parts = key.split(/\[|\]\[|\]/).filter((p) => p !== '');
    let node: Record<string, unknown> | unknown[] = root;
    parts.forEach((part, i) => {
      if (part === '__proto__' || part === 'constructor' || part === 'prototype') return;
      const last = i === parts.length - 1;
      const slot = node as Record<string, unknown>;
      if (last) slot[part] = value;
      else {
        slot[part] ??= /^\d+$/.test(parts[i + 1]) ? [] : {};
        node = slot[part] as Record<string, unknown>;
      }
    });
  }
  return root;
}

function readBody(req: IncomingMessage, limit = 1024 * 1024): Promise<string> {
  return new Promise((resolve, reject) => {
    let size = 0;
    const chunks: Buffer[] = [];
    req.on('data', (chunk: Buffer) => {
      size += chunk.length;
      if (size > limit) {
        reject(new Error('body too large'));
        req.destroy();
      } else chunks.push(chunk);
    });
    req.on('end', () => resolve(Buffer.concat(chunks).toString('utf8')));
    req.on('error', reject);
  });
}

const apiError = (message: string, type = 'invalid_request_error') => ({
  error: { type, message },
});

function sendJson(res: ServerResponse, status: number, body: unknown) {
  res.writeHead(status, { 'Content-Type': 'application/json', 'Request-Id': newId('req') });
  res.end(JSON.stringify(body));
}
function sendText(res: ServerResponse, status: number, body: string) {
  res.writeHead(status, { 'Content-Type': 'text/plain; charset=utf-8' });
  res.end(body);
}
function sendHtml(res: ServerResponse, status: number, body: string) {
  res.writeHead(status, {
    'Content-Type': 'text/html; charset=utf-8',
    'Content-Security-Policy':
      "default-src 'none'; style-src 'unsafe-inline'; form-action 'self' http: https:",
    'Cache-Control': 'no-store',
  });
  res.end(body);
}
function redirect(res: ServerResponse, location: string) {
  res.writeHead(303, { Location: location });
  res.end();
}

const escapeHtml = (value: string) =>
  value.replace(
    /[&<>"']/g,
    (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c,
  );
const money = (cents: number, currency: string) =>
  `${(cents / 100).toFixed(2)} ${currency.toUpperCase()}`;

// Plain forms, no scripts: works in any browser and is easy for tests to "click".
function checkoutPage(session: FakeSession): string {
  const lines = session.line_items.data
    .map(
      (l) => `<li>${escapeHtml(l.description)} — ${money(l.amount_total, session.currency)}</li>`,
    )
    .join('');
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><title>Fake checkout</title>
<style>body{font:16px system-ui,sans-serif;margin:3rem auto;max-width:32rem}button{font-size:1rem;padding:.6rem 1.2rem;margin-right:1rem}</style>
</head><body>
<h1>Fake checkout</h1>
<p>Local test payment page; no money moves and nothing leaves this machine.</p>
<ul>${lines}</ul>
<p><strong>Total: ${money(session.amount_total, session.currency)}</strong></p>
<form method="post" action="/pay/${escapeHtml(session.id)}/complete"><button type="submit">Pay</button></form>
<form method="post" action="/pay/${escapeHtml(session.id)}/cancel"><button type="submit">Cancel</button></form>
</body></html>`;
}

function closedPage(session: FakeSession): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Checkout closed</title></head>
<body><h1>This checkout is ${escapeHtml(session.status)}</h1></body></html>`;
}

// Run directly: `node --import tsx scripts/fake-payments.ts` (npm start and npm test do).
if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  const secret = process.env.FAKE_PAYMENTS_WEBHOOK_SECRET;
  if (!secret) {
    console.error('[fake-payments] FAKE_PAYMENTS_WEBHOOK_SECRET is required');
    process.exit(1);
  }
  const fake = await startFakePayments({
    port: Number(process.env.FAKE_PAYMENTS_PORT ?? 12111),
    webhookUrl:
      process.env.FAKE_PAYMENTS_WEBHOOK_URL ?? 'http://127.0.0.1:3000/api/payments/webhook',
    webhookSecret: secret,
    apiKey: process.env.FAKE_PAYMENTS_API_KEY || undefined,
  });
  console.log(`[fake-payments] provider API and checkout pages on ${fake.url}`);
  const stop = () => void fake.stop().finally(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

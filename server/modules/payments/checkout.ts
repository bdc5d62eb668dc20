import type Stripe from 'stripe';
import type { DataSource } from 'typeorm';
import type { Env } from '../../config/env';
import { AppError } from '../../errors/app-error';
import type { Actor } from '../../middleware/authorise';
import type { InvoicesService } from '../invoices/invoices.service';
import { paymentsUnavailable } from './payment-provider';

export interface CheckoutDeps {
  db: DataSource;
  env: Pick<Env, 'APP_URL' | 'PAYMENTS_CURRENCY'>;
  provider: Stripe | null;
  invoices: InvoicesService;
}

/** What `POST /api/invoices/:id/checkout` answers: where to send the payer. */
export interface CheckoutStarted {
  checkoutUrl: string;
  sessionId: string;
  amountCents: number;
  expiresAt: string | null;
}

/**
 * Starts a hosted checkout for what is still owed on a sent invoice. An open session for the
 * same amount is handed out again rather than opening a second one the grower might also pay.
 */
export async function startCheckout(
  deps: CheckoutDeps,
  actor: Actor,
  invoiceId: string,
): Promise<CheckoutStarted> {
  const { invoice, open } = await deps.db.transaction(async (tx) => {
    const invoice = await deps.invoices.forPayment(tx, actor, invoiceId);
    if (invoice.status !== 'sent')
      throw new AppError(
        409,
        'conflict',
        invoice.status === 'draft'
          ? 'This invoice has not been sent yet.'
          : `This invoice is ${invoice.status}; there is nothing to pay.`,
      );
    if (invoice.outstandingCents <= 0)
      throw new AppError(409, 'conflict', 'Nothing is owed on this invoice.');
    const [open]: Array<{ provider_session_id: string; url: string; expires_at: Date | null }> =
      await tx.query(
        `SELECT provider_session_id, url, expires_at FROM checkout_sessions
          WHERE operation_id = $1 AND invoice_id = $2 AND status = 'open' AND amount_cents = $3
            AND (expires_at IS NULL OR expires_at > now() + interval '10 minutes')
          ORDER BY created_at DESC LIMIT 1`,
        [actor.operationId, invoiceId, invoice.outstandingCents],
      );
    return { invoice, open };
  });
  if (open)
    return {
      checkoutUrl: open.url,
      sessionId: open.provider_session_id,
      amountCents: invoice.outstandingCents,
      expiresAt: open.expires_at?.toISOString() ?? null,
    };
  if (!deps.provider) throw paymentsUnavailable();

  const back = `${deps.env.APP_URL.replace(/\/+$/, '')}/invoices/${invoice.id}`;
  let session: Stripe.Checkout.Session;
  try {
    session = await deps.provider.checkout.sessions.create({
      mode: 'payment',
      line_items: [
        {
          quantity: 1,
          price_data: {
            currency: deps.env.PAYMENTS_CURRENCY,
            unit_amount: invoice.outstandingCents,
            product_data: {
              name: `Invoice ${invoice.number}: ${invoice.crop} pollination ${invoice.kind}, ${invoice.season}`,
            },
          },
        },
      ],
      success_url: `${back}?payment=complete&session={CHECKOUT_SESSION_ID}`,
      cancel_url: `${back}?payment=cancelled`,
      client_reference_id: invoice.id,
      metadata: {
        invoiceId: invoice.id,
        operationId: actor.operationId,
        invoiceNumber: String(invoice.number),
      },
    });
  } catch {
    throw new AppError(
      503,
      'service_unavailable',
      'The payment provider did not answer. Try again in a minute.',
      {},
      { 'Retry-After': '60' },
    );
  }
  if (!session.url) throw new AppError(503, 'service_unavailable', 'No checkout page was given.');
  const expiresAt = session.expires_at ? new Date(session.expires_at * 1000) : null;
  await deps.db.query(
    `INSERT INTO checkout_sessions (operation_id, invoice_id, provider_session_id, url, amount_cents, currency, status, expires_at, created_by)
     VALUES ($1, $2, $3, $4, $5, $6, 'open', $7, $8)`,
    [
      actor.operationId,
      invoice.id,
      session.id,
      session.url,
      invoice.outstandingCents,
      deps.env.PAYMENTS_CURRENCY,
      expiresAt,
      actor.id,
    ],
  );
  return {
    checkoutUrl: session.url,
    sessionId: session.id,
    amountCents: invoice.outstandingCents,
    expiresAt: expiresAt?.toISOString() ?? null,
  };
}

import type Stripe from 'stripe';
import type { DataSource, EntityManager } from 'typeorm';

/** What applying one webhook event did, recorded with the event. */
export type EventOutcome =
  | 'duplicate'
  | 'ignored'
  | 'unknown-session'
  | 'mismatched-invoice'
  | 'paid'
  | 'part-paid'
  | 'payment-on-closed-invoice'
  | 'payment-already-recorded'
  | 'awaiting-payment'
  | 'expired'
  | 'stale';

const paidTypes = ['checkout.session.completed', 'checkout.session.async_payment_succeeded'];
const closingTypes = ['checkout.session.expired', 'checkout.session.async_payment_failed'];

/**
 * Applies a verified webhook event once, in one transaction. The event id is recorded first
 * (UNIQUE), so a redelivery finds it and changes nothing; a payment is keyed by the provider's
 * reference (UNIQUE), so two events about one payment record it once. Events only ever move
 * things forward: a payment is never taken back by a later or older event, and an expiry
 * closes a session only while it is still open, so a replayed or out-of-order event cannot
 * un-pay an invoice.
 */
export async function applyPaymentEvent(
  db: DataSource,
  event: Stripe.Event,
): Promise<EventOutcome> {
  return db.transaction(async (tx) => {
    const isSession = event.type.startsWith('checkout.session.');
    const session = isSession ? (event.data.object as Stripe.Checkout.Session) : null;
    const [recorded]: Array<{ id: string }> = await tx.query(
      `INSERT INTO payment_events (provider_event_id, type, provider_session_id, provider_created_at, outcome)
       VALUES ($1, $2, $3, to_timestamp($4), 'received')
       ON CONFLICT (provider_event_id) DO NOTHING RETURNING id`,
      [event.id, event.type, session?.id ?? null, event.created],
    );
    if (!recorded) return 'duplicate';
    const result = await applySessionEvent(tx, event.type, session);
    await tx.query(
      `UPDATE payment_events SET outcome = $2, operation_id = $3, invoice_id = $4 WHERE id = $1`,
      [recorded.id, result.outcome, result.operationId ?? null, result.invoiceId ?? null],
    );
    return result.outcome;
  });
}

interface Applied {
  outcome: EventOutcome;
  operationId?: string;
  invoiceId?: string;
}

async function applySessionEvent(
  tx: EntityManager,
  type: string,
  session: Stripe.Checkout.Session | null,
): Promise<Applied> {
  if (!session || (!paidTypes.includes(type) && !closingTypes.includes(type)))
    return { outcome: 'ignored' };
  // Only sessions we opened count; the metadata alone is not trusted to name an invoice.
  const [ours]: Array<{
    id: string;
    operation_id: string;
    invoice_id: string;
    status: string;
    amount_cents: number;
  }> = await tx.query(
    `SELECT id, operation_id, invoice_id, status, amount_cents FROM checkout_sessions
        WHERE provider_session_id = $1 FOR UPDATE`,
    [session.id],
  );
  if (!ours) return { outcome: 'unknown-session' };
  const where = { operationId: ours.operation_id, invoiceId: ours.invoice_id };
  if (session.metadata?.invoiceId && session.metadata.invoiceId !== ours.invoice_id)
    return { outcome: 'mismatched-invoice', ...where };

  if (closingTypes.includes(type)) {
    if (ours.status !== 'open') return { outcome: 'stale', ...where };
    await tx.query(
      `UPDATE checkout_sessions SET status = 'expired', closed_at = now() WHERE id = $1`,
      [ours.id],
    );
    return { outcome: 'expired', ...where };
  }
  if (session.payment_status !== 'paid') return { outcome: 'awaiting-payment', ...where };

  const [invoice]: Array<{ status: string; amount_cents: number }> = await tx.query(
    `SELECT status, amount_cents FROM invoices WHERE id = $1 AND operation_id = $2 FOR UPDATE`,
    [ours.invoice_id, ours.operation_id],
  );
  const reference =
    typeof session.payment_intent === 'string'
      ? session.payment_intent
      : (session.payment_intent?.id ?? session.id);
  const amount = session.amount_total ?? ours.amount_cents;
  const inserted: Array<{ id: string }> = await tx.query(
    `INSERT INTO payments (operation_id, invoice_id, amount_cents, provider_reference, provider_session_id, received_at)
     VALUES ($1, $2, $3, $4, $5, now())
     ON CONFLICT (provider_reference) DO NOTHING RETURNING id`,
    [ours.operation_id, ours.invoice_id, amount, reference, session.id],
  );
  await tx.query(
    `UPDATE checkout_sessions SET status = 'complete', closed_at = COALESCE(closed_at, now()) WHERE id = $1`,
    [ours.id],
  );
  if (inserted.length === 0) return { outcome: 'payment-already-recorded', ...where };
  if (invoice.status !== 'sent') return { outcome: 'payment-on-closed-invoice', ...where };
  const [paid]: Array<{ total: number }> = await tx.query(
    `SELECT COALESCE(SUM(amount_cents), 0)::int AS total FROM payments WHERE invoice_id = $1`,
    [ours.invoice_id],
  );
  if (paid.total < invoice.amount_cents) return { outcome: 'part-paid', ...where };
  await tx.query(
    `UPDATE invoices SET status = 'paid', paid_at = now(), version = version + 1, updated_at = now()
      WHERE id = $1 AND status = 'sent'`,
    [ours.invoice_id],
  );
  return { outcome: 'paid', ...where };
}

import type Stripe from 'stripe';
import type { DataSource } from 'typeorm';

/**
 * Asks the provider to expire the invoice's open checkout sessions (after a void), best effort:
 * the provider's own `checkout.session.expired` webhook then closes them here. If the provider
 * cannot be reached, a payment that still arrives is recorded against the void invoice and
 * shows in the payments export for a refund.
 */
export async function closeOpenCheckouts(
  db: DataSource,
  provider: Stripe | null,
  operationId: string,
  invoiceId: string,
): Promise<void> {
  if (!provider) return;
  const open: Array<{ provider_session_id: string }> = await db.query(
    `SELECT provider_session_id FROM checkout_sessions
      WHERE operation_id = $1 AND invoice_id = $2 AND status = 'open'`,
    [operationId, invoiceId],
  );
  for (const session of open) {
    await provider.checkout.sessions.expire(session.provider_session_id).catch(() => undefined);
  }
}

import { Alert } from '@/components/ui/alert';
import type { InvoiceStatus } from '@shared/schemas/invoices';

/** How the payer came back from the provider's page: `?payment=complete|cancelled`. */
export type PaymentOutcome = 'complete' | 'cancelled';

export const paymentOutcomeFrom = (value: string | null): PaymentOutcome | null =>
  value === 'complete' || value === 'cancelled' ? value : null;

/**
 * The result of a hosted checkout. "Complete" is only believed once the invoice reads paid:
 * the provider's signed event, not the return address, is what marks money received.
 */
export function PaymentResult({
  outcome,
  status,
  checking,
}: {
  outcome: PaymentOutcome;
  status: InvoiceStatus;
  /** Still looking again for the webhook's mark. */
  checking: boolean;
}) {
  if (outcome === 'cancelled')
    return (
      <Alert tone="warning" title="Payment not completed">
        You left the payment page before paying, so nothing was charged. The invoice is still open;
        pay whenever you are ready.
      </Alert>
    );
  if (status === 'paid')
    return (
      <div
        role="status"
        className="rounded-md border border-sage-400/50 bg-sage-900 px-4 py-3 text-sage-300"
      >
        <p className="font-semibold">Payment received — thank you</p>
        <p className="mt-1 text-sm">This invoice is paid in full.</p>
      </div>
    );
  if (checking)
    return (
      <Alert tone="info" title="Confirming your payment…">
        The payment provider is letting us know; this takes a few seconds.
      </Alert>
    );
  return (
    <Alert tone="warning" title="Payment not confirmed yet">
      We have not heard back from the payment provider. If you paid, it will show here shortly;
      reload this page in a minute or two before trying again.
    </Alert>
  );
}

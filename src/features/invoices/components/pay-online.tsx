import { Button } from '@/components/ui/button';
import { formatDollars } from '@/lib/units';
import { useStartCheckout } from '../api/start-checkout';
import type { Invoice } from '../types';
import { InvoiceActionAlert } from './invoice-action-alert';

/** The grower's way to pay: off to the provider's hosted page, and back here afterwards. */
export function PayOnline({ invoice }: { invoice: Invoice }) {
  const checkout = useStartCheckout();
  return (
    <div className="flex flex-col gap-3">
      <p>
        {formatDollars(invoice.outstandingCents)} is owed. You pay on our payment provider’s secure
        page and come straight back here.
      </p>
      <InvoiceActionAlert error={checkout.error} title="The payment page could not be opened." />
      <div>
        <Button
          onClick={() => checkout.mutate(invoice.id)}
          busy={checkout.isPending || checkout.isSuccess}
        >
          Pay online
        </Button>
      </div>
    </div>
  );
}

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { useToast } from '@/components/ui/toast';
import { todayIso } from '@/lib/units';
import { useIssueInvoice, useVoidInvoice } from '../api/change-invoice';
import type { Invoice } from '../types';
import { InvoiceActionAlert } from './invoice-action-alert';

/** The owner's buttons for an invoice: issue a draft (optional due date), void (confirmed). */
export function InvoiceOwnerActions({ invoice }: { invoice: Invoice }) {
  const toast = useToast();
  const issue = useIssueInvoice();
  const voiding = useVoidInvoice();
  const [dialog, setDialog] = useState<'issue' | 'void' | null>(null);
  const [dueOn, setDueOn] = useState('');
  const canVoid =
    invoice.status === 'draft' || (invoice.status === 'sent' && invoice.paidCents === 0);
  const close = () => {
    setDialog(null);
    issue.reset();
    voiding.reset();
  };
  if (invoice.status !== 'draft' && !canVoid) return null;

  return (
    <>
      {invoice.status === 'draft' && (
        <Button onClick={() => setDialog('issue')}>Issue invoice</Button>
      )}
      {canVoid && (
        <Button variant="danger" onClick={() => setDialog('void')}>
          Void
        </Button>
      )}
      <Dialog open={dialog === 'issue'} title={`Issue invoice ${invoice.number}?`} onClose={close}>
        <form
          aria-label="Issue invoice"
          onSubmit={(event) => {
            event.preventDefault();
            issue.mutate(
              { id: invoice.id, version: invoice.version, ...(dueOn ? { dueOn } : {}) },
              {
                onSuccess: () => {
                  toast.show(`Invoice ${invoice.number} sent to ${invoice.growerName}.`);
                  close();
                },
              },
            );
          }}
          className="flex flex-col gap-4"
        >
          <p>It is dated today and e-mailed to {invoice.growerName} with a link to pay online.</p>
          <Field label="Due date" hint="Leave empty for 30 days from today.">
            <Input
              type="date"
              value={dueOn}
              min={todayIso()}
              onChange={(e) => setDueOn(e.target.value)}
            />
          </Field>
          <InvoiceActionAlert error={issue.error} title="The invoice was not issued." />
          <div className="flex gap-2">
            <Button type="submit" busy={issue.isPending}>
              Issue and e-mail
            </Button>
            <Button variant="ghost" onClick={close}>
              Not yet
            </Button>
          </div>
        </form>
      </Dialog>
      <Dialog open={dialog === 'void'} title={`Void invoice ${invoice.number}?`} onClose={close}>
        <p>
          The invoice is cancelled but keeps its number. {invoice.growerName} can no longer pay it
          online. The contract can be billed again afterwards.
        </p>
        <div className="mt-4 flex flex-col gap-4">
          <InvoiceActionAlert error={voiding.error} title="The invoice was not voided." />
          <div className="flex gap-2">
            <Button
              variant="danger"
              busy={voiding.isPending}
              onClick={() =>
                voiding.mutate(
                  { id: invoice.id, version: invoice.version },
                  {
                    onSuccess: () => {
                      toast.show(`Invoice ${invoice.number} voided.`);
                      close();
                    },
                  },
                )
              }
            >
              Void invoice
            </Button>
            <Button variant="ghost" onClick={close}>
              Keep it
            </Button>
          </div>
        </div>
      </Dialog>
    </>
  );
}

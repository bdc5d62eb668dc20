import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Field } from '@/components/ui/field';
import { Select } from '@/components/ui/input';
import { useToast } from '@/components/ui/toast';
import { useCreateInvoice } from '../api/create-invoice';
import { InvoiceActionAlert } from './invoice-action-alert';

/** A contract that may be billed, as the picker shows it. */
export interface BillableContract {
  id: string;
  label: string;
}

/**
 * "Bill this contract": the owner picks a contract and deposit or balance; the server works out
 * the lines and refuses (409) what cannot be billed yet, which is shown as it says.
 */
export function BillContractDialog({
  open,
  onClose,
  contracts,
}: {
  open: boolean;
  onClose: () => void;
  contracts: BillableContract[];
}) {
  const create = useCreateInvoice();
  const toast = useToast();
  const navigate = useNavigate();
  const [contractId, setContractId] = useState('');
  const [kind, setKind] = useState<'deposit' | 'balance'>('deposit');
  const close = () => {
    create.reset();
    onClose();
  };
  return (
    <Dialog open={open} title="Bill a contract" onClose={close}>
      <form
        aria-label="Bill a contract"
        className="flex flex-col gap-4"
        onSubmit={(event) => {
          event.preventDefault();
          if (!contractId) return;
          create.mutate(
            { contractId, kind },
            {
              onSuccess: (invoice) => {
                toast.show(`Draft invoice ${invoice.number} created.`);
                navigate(paths.invoice(invoice.id));
              },
            },
          );
        }}
      >
        <p className="text-sm text-dusk-300">
          Amounts come from the contract: the deposit as agreed, or the balance from the colonies
          the ledger shows placed. It starts as a draft for you to check before issuing.
        </p>
        <Field label="Contract">
          <Select required value={contractId} onChange={(e) => setContractId(e.target.value)}>
            <option value="">Choose a contract…</option>
            {contracts.map((c) => (
              <option key={c.id} value={c.id}>
                {c.label}
              </option>
            ))}
          </Select>
        </Field>
        <fieldset className="flex flex-col gap-2">
          <legend className="mb-1 text-sm font-medium text-dusk-100">What to bill</legend>
          <label className="flex items-center gap-2">
            <input
              type="radio"
              name="kind"
              value="deposit"
              checked={kind === 'deposit'}
              onChange={() => setKind('deposit')}
            />
            Deposit
          </label>
          <label className="flex items-center gap-2">
            <input
              type="radio"
              name="kind"
              value="balance"
              checked={kind === 'balance'}
              onChange={() => setKind('balance')}
            />
            Balance (from colonies placed)
          </label>
        </fieldset>
        <InvoiceActionAlert error={create.error} title="This contract cannot be billed yet." />
        <div className="flex gap-2">
          <Button type="submit" busy={create.isPending} disabled={!contractId}>
            Create draft invoice
          </Button>
          <Button variant="ghost" onClick={close}>
            Cancel
          </Button>
        </div>
      </form>
    </Dialog>
  );
}

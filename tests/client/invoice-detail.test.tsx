import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { SessionUser } from '@shared/schemas/users';
import { InvoiceDetailView } from '@/features/invoices/components/invoice-detail';
import type { InvoiceDetail } from '@/features/invoices/types';
import { apiError, mockFetch, planner, renderWithProviders } from './support';

const owner: SessionUser = { ...planner, id: planner.id.replace(/1$/, '2'), role: 'owner' };
const grower: SessionUser = {
  ...planner,
  id: planner.id.replace(/1$/, '3'),
  role: 'grower',
  growerId: '00000000-0000-4000-8000-0000000000b1',
};

const invoice = (changes: Partial<InvoiceDetail> = {}): InvoiceDetail => ({
  id: '00000000-0000-4000-8000-00000000a001',
  number: 7,
  kind: 'balance',
  status: 'draft',
  contractId: '00000000-0000-4000-8000-0000000000c1',
  growerId: '00000000-0000-4000-8000-0000000000b1',
  growerName: 'Sunfold Almond Ranch',
  crop: 'almond',
  season: 2027,
  // Worked example A of docs/payments.md.
  lines: [
    { kind: 'fee', description: '96 colonies at $195.00', amountCents: 1_872_000 },
    { kind: 'strength-adjustment', description: 'Strength 7.50 of 8 frames', amountCents: -36_000 },
    { kind: 'deposit-paid', description: 'Deposit received', amountCents: -500_000 },
  ],
  amountCents: 1_336_000,
  paidCents: 0,
  outstandingCents: 1_336_000,
  issuedOn: null,
  dueOn: null,
  paidAt: null,
  voidedAt: null,
  basis: {
    coloniesPlaced: 96,
    feePerColonyCents: 19_500,
    strength: {
      coloniesSampled: 12,
      measuredAverageFrames: 7.5,
      targetAverageFrames: 8,
      perFramePerColonyCents: 750,
      reductionsOnly: false,
    },
    depositPaidCents: 500_000,
  },
  internalNotes: '',
  version: 3,
  createdAt: '2027-03-20T16:00:00.000Z',
  operationName: 'Test Apiaries',
  billingAddress: '1 Orchard Rd',
  payments: [],
  ...changes,
});

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('InvoiceDetailView', () => {
  it('when the owner opens a draft then the lines, the basis and Issue and Void show', async () => {
    const { requests } = mockFetch((r) =>
      r.url.endsWith('/issue')
        ? { status: 200, body: { ...invoice(), status: 'sent', version: 4 } }
        : { status: 200, body: { csrfToken: 't' } },
    );
    const user = userEvent.setup();
    renderWithProviders(<InvoiceDetailView invoice={invoice()} />, { user: owner });
    expect(screen.getByTestId('invoice-total').textContent).toBe('$13,360.00');
    expect(screen.getByText(/96 colonies placed/)).toBeTruthy();
    expect(screen.getByText(/averaged 7.50 frames against the 8 agreed/)).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Void' })).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Issue invoice' }));
    await user.type(screen.getByLabelText('Due date'), '2027-04-30');
    await user.click(screen.getByRole('button', { name: 'Issue and e-mail' }));
    await waitFor(() => expect(requests.some((r) => r.url.endsWith('/issue'))).toBe(true));
    expect(requests.find((r) => r.url.endsWith('/issue'))!.body).toEqual({
      version: 3,
      dueOn: '2027-04-30',
    });
    expect(screen.queryByRole('button', { name: 'Pay online' })).toBeNull();
  });

  it('when voiding is refused by the server then its message shows in the dialog', async () => {
    mockFetch(() =>
      apiError(409, 'conflict', 'Money has been received on this invoice; it cannot be voided.'),
    );
    const user = userEvent.setup();
    renderWithProviders(<InvoiceDetailView invoice={invoice({ status: 'sent' })} />, {
      user: owner,
    });
    await user.click(screen.getByRole('button', { name: 'Void' }));
    await user.click(screen.getByRole('button', { name: 'Void invoice' }));
    expect(await screen.findByText(/it cannot be voided/)).toBeTruthy();
  });

  it('when a planner opens it then nothing can be changed or paid', () => {
    renderWithProviders(<InvoiceDetailView invoice={invoice({ status: 'sent' })} />);
    expect(screen.queryByRole('button', { name: 'Issue invoice' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Void' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Pay online' })).toBeNull();
    expect(screen.getByTestId('invoice-total').textContent).toBe('$13,360.00');
  });

  it('when the grower opens a sent invoice then Pay online starts checkout and leaves for the provider', async () => {
    const { requests } = mockFetch((r) =>
      r.url.endsWith('/checkout')
        ? {
            status: 201,
            body: {
              checkoutUrl: 'http://127.0.0.1:12111/pay/cs_test_1',
              sessionId: 'cs_test_1',
              amountCents: 1_336_000,
              expiresAt: null,
            },
          }
        : { status: 200, body: { csrfToken: 't' } },
    );
    const assign = vi.fn();
    vi.stubGlobal('location', { ...window.location, assign });
    const user = userEvent.setup();
    renderWithProviders(
      <InvoiceDetailView invoice={invoice({ status: 'sent', internalNotes: undefined })} />,
      { user: grower },
    );
    expect(screen.queryByRole('button', { name: 'Void' })).toBeNull();
    await user.click(screen.getByRole('button', { name: 'Pay online' }));
    await waitFor(() =>
      expect(assign).toHaveBeenCalledWith('http://127.0.0.1:12111/pay/cs_test_1'),
    );
    expect(requests.find((r) => r.url.endsWith('/checkout'))!.method).toBe('POST');
  });

  it('when the grower comes back paid then the thanks show; cancelled says not completed', () => {
    const { unmount } = renderWithProviders(
      <InvoiceDetailView
        invoice={invoice({ status: 'paid', paidCents: 1_336_000, outstandingCents: 0 })}
        payment={{ outcome: 'complete', checking: false }}
      />,
      { user: grower },
    );
    expect(screen.getByText('Payment received — thank you')).toBeTruthy();
    unmount();
    renderWithProviders(
      <InvoiceDetailView
        invoice={invoice({ status: 'sent' })}
        payment={{ outcome: 'cancelled', checking: false }}
      />,
      { user: grower },
    );
    expect(screen.getByText('Payment not completed')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Pay online' })).toBeTruthy();
  });
});

import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { SessionUser } from '@shared/schemas/users';
import { PendingProposal } from '@/features/portal/components/pending-proposal';
import type { Proposal } from '@/features/portal/types';
import { apiError, mockFetch, planner, renderWithProviders } from './support';

const grower: SessionUser = {
  ...planner,
  role: 'grower',
  growerId: '00000000-0000-4000-8000-0000000000bb',
};
const proposal: Proposal = {
  id: '55555555-5555-4555-8555-555555555555',
  contractId: '66666666-6666-4666-8666-666666666666',
  deliveryStartOn: '2027-02-10',
  deliveryEndOn: '2027-02-14',
  colonies: 480,
  note: 'Two trucks, after dusk.',
  status: 'open',
  expiresAt: '2027-01-30T00:00:00.000Z',
  respondedAt: null,
  respondedVia: null,
  counter: null,
  responseNote: '',
  version: 1,
  createdAt: '2027-01-16T00:00:00.000Z',
};
const answered = { proposal: { ...proposal, status: 'confirmed' }, contract: { status: 'agreed' } };

afterEach(() => vi.unstubAllGlobals());

describe('PendingProposal', () => {
  it('when the grower confirms then the confirm endpoint gets the note and the contracts refresh', async () => {
    const { requests } = mockFetch(() => ({ status: 200, body: answered }));
    const onAnswered = vi.fn();
    const user = userEvent.setup();
    renderWithProviders(
      <PendingProposal proposal={proposal} operationName="Test Apiaries" onAnswered={onAnswered} />,
      { user: grower },
    );

    expect(screen.getByText('Feb 10, 2027 – Feb 14, 2027')).toBeTruthy();
    expect(screen.getByText('480 colonies')).toBeTruthy();
    expect(screen.getByText('Two trucks, after dusk.')).toBeTruthy();
    await user.type(screen.getByLabelText('Note to the beekeeper (optional)'), 'Gate code 1234');
    await user.click(screen.getByRole('button', { name: 'Confirm these dates' }));

    await waitFor(() => expect(onAnswered).toHaveBeenCalled());
    expect(requests[0].method).toBe('POST');
    expect(requests[0].url).toBe(`/api/proposals/${proposal.id}/confirm`);
    expect(requests[0].body).toEqual({ note: 'Gate code 1234' });
  });

  it('when the grower declines then the decline endpoint is called', async () => {
    const { requests } = mockFetch(() => ({ status: 200, body: answered }));
    const user = userEvent.setup();
    renderWithProviders(<PendingProposal proposal={proposal} operationName="Test Apiaries" />, {
      user: grower,
    });
    await user.click(screen.getByRole('button', { name: 'Decline' }));
    await waitFor(() => expect(requests).toHaveLength(1));
    expect(requests[0].url).toBe(`/api/proposals/${proposal.id}/decline`);
    expect(requests[0].body).toEqual({});
  });

  it('when the grower proposes a window that ends before it starts then the shared schema says so; a valid one is posted', async () => {
    const { requests } = mockFetch(() => ({ status: 200, body: answered }));
    const user = userEvent.setup();
    renderWithProviders(<PendingProposal proposal={proposal} operationName="Test Apiaries" />, {
      user: grower,
    });
    await user.click(screen.getByRole('button', { name: 'Propose another window' }));
    const start = screen.getByLabelText('First delivery day');
    await user.clear(start);
    await user.type(start, '2027-02-20');
    await user.click(screen.getByRole('button', { name: 'Send this window' }));
    expect(await screen.findByText('The delivery window ends on or after it starts.')).toBeTruthy();
    expect(requests).toHaveLength(0);

    const end = screen.getByLabelText('Last delivery day');
    await user.clear(end);
    await user.type(end, '2027-02-24');
    await user.type(screen.getByLabelText('Colonies (optional)'), '400');
    await user.type(screen.getByLabelText('Note to the beekeeper (optional)'), 'Bloom is late.');
    await user.click(screen.getByRole('button', { name: 'Send this window' }));
    await waitFor(() => expect(requests).toHaveLength(1));
    expect(requests[0].url).toBe(`/api/proposals/${proposal.id}/counter`);
    expect(requests[0].body).toEqual({
      deliveryStartOn: '2027-02-20',
      deliveryEndOn: '2027-02-24',
      colonies: 400,
      note: 'Bloom is late.',
    });
  });

  it('when the proposal was already answered then a 409 is explained', async () => {
    mockFetch(() => apiError(409, 'conflict', 'This proposal is already confirmed.'));
    const user = userEvent.setup();
    renderWithProviders(<PendingProposal proposal={proposal} operationName="Test Apiaries" />, {
      user: grower,
    });
    await user.click(screen.getByRole('button', { name: 'Confirm these dates' }));
    expect(await screen.findByText(/already answered or replaced/)).toBeTruthy();
  });
});

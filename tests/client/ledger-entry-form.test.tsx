import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { LedgerEntryForm } from '@/features/ledger/components/ledger-entry-form';
import { apiError, mockFetch, renderWithProviders } from './support';

const yardId = '22222222-2222-4222-8222-222222222222';
const lotId = '33333333-3333-4333-8333-333333333333';
const lots = [{ id: lotId, name: 'Two-deep winter lot', coloniesHere: 120 }];

describe('LedgerEntryForm', () => {
  it('when no reason is given then shows the schema message "Say why." and sends nothing', async () => {
    const { fetchMock } = mockFetch(() => ({ status: 500 }));
    const user = userEvent.setup();
    renderWithProviders(
      <LedgerEntryForm
        place={{ kind: 'yard', id: yardId }}
        placeName="Tecolote Draw"
        lots={lots}
      />,
    );

    await user.type(screen.getByLabelText('Number of colonies'), '5');
    await user.click(screen.getByRole('button', { name: 'Record entry' }));

    expect(await screen.findByText('Say why.')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('when a loss is recorded then it leaves from this yard and the caller hears the count', async () => {
    const { requests } = mockFetch(() => ({ status: 201, body: { id: 'x' } }));
    const onRecorded = vi.fn();
    const user = userEvent.setup();
    renderWithProviders(
      <LedgerEntryForm
        place={{ kind: 'yard', id: yardId }}
        placeName="Tecolote Draw"
        lots={lots}
        onRecorded={onRecorded}
      />,
    );

    await user.type(screen.getByLabelText('Number of colonies'), '5');
    await user.type(screen.getByLabelText('Reason'), 'Dead-outs after the freeze');
    await user.click(screen.getByRole('button', { name: 'Record entry' }));

    await waitFor(() =>
      expect(onRecorded).toHaveBeenCalledWith('5 colonies removed from Tecolote Draw.'),
    );
    expect(requests[0].body).toMatchObject({
      lotId,
      kind: 'loss',
      colonies: 5,
      from: { kind: 'yard', id: yardId },
      to: null,
    });
  });

  it('when a correction adds colonies then it arrives at this yard with no "from"', async () => {
    const { requests } = mockFetch(() => ({ status: 201, body: { id: 'x' } }));
    const user = userEvent.setup();
    renderWithProviders(
      <LedgerEntryForm
        place={{ kind: 'yard', id: yardId }}
        placeName="Tecolote Draw"
        lots={lots}
        onRecorded={vi.fn()}
      />,
    );

    await user.selectOptions(screen.getByLabelText('What happened'), 'correction-add');
    await user.type(screen.getByLabelText('Number of colonies'), '3');
    await user.type(screen.getByLabelText('Reason'), 'Recount');
    await user.click(screen.getByRole('button', { name: 'Record entry' }));

    await waitFor(() => expect(requests).toHaveLength(1));
    expect(requests[0].body).toMatchObject({
      kind: 'correction',
      from: null,
      to: { kind: 'yard', id: yardId },
    });
  });

  it('when the server says too few colonies are there (409) then the message is shown', async () => {
    mockFetch(() =>
      apiError(
        409,
        'conflict',
        'Only 4 colonies of this lot are there on 2026-12-01 (or later); 5 cannot leave.',
      ),
    );
    const user = userEvent.setup();
    renderWithProviders(
      <LedgerEntryForm
        place={{ kind: 'yard', id: yardId }}
        placeName="Tecolote Draw"
        lots={lots}
      />,
    );

    await user.type(screen.getByLabelText('Number of colonies'), '5');
    await user.type(screen.getByLabelText('Reason'), 'Dead-outs');
    await user.click(screen.getByRole('button', { name: 'Record entry' }));

    expect(await screen.findByText(/Only 4 colonies of this lot are there/)).toBeTruthy();
  });
});

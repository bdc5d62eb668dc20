import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { StrengthSampleForm } from '@/features/samples/components/strength-sample-form';
import { apiError, mockFetch, renderWithProviders } from './support';

const yardId = '22222222-2222-4222-8222-222222222222';
const lotId = '33333333-3333-4333-8333-333333333333';
const otherLotId = '44444444-4444-4444-8444-444444444444';
const lots = [
  { id: lotId, name: 'Two-deep winter lot', coloniesHere: 120 },
  { id: otherLotId, name: 'Spring nucs', coloniesHere: 40 },
];

describe('StrengthSampleForm', () => {
  it('when frame counts are typed one per line then they are posted for this yard and the chosen lot', async () => {
    const { requests } = mockFetch(() => ({ status: 201, body: { id: 's1' } }));
    const onRecorded = vi.fn();
    const user = userEvent.setup();
    renderWithProviders(
      <StrengthSampleForm
        yardId={yardId}
        yardName="Tecolote Draw"
        lots={lots}
        onRecorded={onRecorded}
      />,
    );

    await user.selectOptions(screen.getByLabelText('Colony lot'), otherLotId);
    const date = screen.getByLabelText('Date');
    await user.clear(date);
    await user.type(date, '2026-02-03');
    await user.type(
      screen.getByLabelText('Frames of bees per colony'),
      '8{Enter}6,7.5{Enter}{Enter}5 ; 9',
    );
    await user.type(screen.getByLabelText('Notes'), '  Warm, 64 °F  ');
    await user.click(screen.getByRole('button', { name: 'Record strength check' }));

    await waitFor(() =>
      expect(onRecorded).toHaveBeenCalledWith(
        'Strength check of 5 colonies recorded at Tecolote Draw.',
      ),
    );
    expect(requests[0].url).toBe('/api/strength-samples');
    expect(requests[0].body).toEqual({
      placeKind: 'yard',
      placeId: yardId,
      lotId: otherLotId,
      sampledOn: '2026-02-03',
      frames: [8, 6, 7.5, 5, 9],
      notes: 'Warm, 64 °F',
    });
  });

  it('when an entry is not a number then it is named and nothing is sent', async () => {
    const { fetchMock } = mockFetch(() => ({ status: 201, body: {} }));
    const user = userEvent.setup();
    renderWithProviders(
      <StrengthSampleForm yardId={yardId} yardName="Tecolote Draw" lots={lots} />,
    );

    await user.type(screen.getByLabelText('Frames of bees per colony'), '8 six 7');
    await user.click(screen.getByRole('button', { name: 'Record strength check' }));

    expect(await screen.findByText(/^Not a number: "six"\./)).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('when nothing is typed then it asks for at least one colony', async () => {
    const { fetchMock } = mockFetch(() => ({ status: 201, body: {} }));
    const user = userEvent.setup();
    renderWithProviders(
      <StrengthSampleForm yardId={yardId} yardName="Tecolote Draw" lots={lots} />,
    );

    await user.click(screen.getByRole('button', { name: 'Record strength check' }));

    expect(await screen.findByText('Enter at least one colony.')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('when a count is over 40 frames then the shared schema message names that reading', async () => {
    const { fetchMock } = mockFetch(() => ({ status: 201, body: {} }));
    const user = userEvent.setup();
    renderWithProviders(
      <StrengthSampleForm yardId={yardId} yardName="Tecolote Draw" lots={lots} />,
    );

    await user.type(screen.getByLabelText('Frames of bees per colony'), '8 7 41');
    await user.click(screen.getByRole('button', { name: 'Record strength check' }));

    expect(await screen.findByText('Reading 3 (41): At most 40 frames.')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('when the server refuses frames.1 (400) then the message shows on the readings field', async () => {
    mockFetch(() =>
      apiError(400, 'validation_failed', 'The request has problems.', [
        { field: 'frames.1', message: 'At most 40 frames.' },
        { field: 'lotId', message: 'No such colony lot.' },
      ]),
    );
    const user = userEvent.setup();
    renderWithProviders(
      <StrengthSampleForm yardId={yardId} yardName="Tecolote Draw" lots={lots} />,
    );

    await user.type(screen.getByLabelText('Frames of bees per colony'), '8 12');
    await user.click(screen.getByRole('button', { name: 'Record strength check' }));

    expect(await screen.findByText('Reading 2 (12): At most 40 frames.')).toBeTruthy();
    expect(screen.getByText('No such colony lot.')).toBeTruthy();
    await waitFor(() =>
      expect(screen.getByLabelText('Frames of bees per colony').getAttribute('aria-invalid')).toBe(
        'true',
      ),
    );
  });
});

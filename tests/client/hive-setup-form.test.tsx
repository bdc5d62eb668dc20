import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { HiveSetupForm } from '@/features/settings/components/hive-setup-form';
import { mockFetch, renderWithProviders } from './support';

describe('HiveSetupForm', () => {
  it('when a box is added and filled then the stack is posted bottom first with fill as a share', async () => {
    const { requests } = mockFetch(() => ({
      status: 201,
      body: { id: 'h1', name: 'Deep + shallow', boxes: [], version: 1 },
    }));
    const onSaved = vi.fn();
    const user = userEvent.setup();
    renderWithProviders(<HiveSetupForm units="imperial" onSaved={onSaved} onCancel={vi.fn()} />);

    await user.type(screen.getByLabelText('Setup name'), 'Deep + shallow');
    await user.click(screen.getByRole('button', { name: 'Add box' }));
    await user.selectOptions(screen.getByLabelText('Box 2 size'), 'shallow');
    await user.clear(screen.getByLabelText('Box 2 honey fill (%)'));
    await user.type(screen.getByLabelText('Box 2 honey fill (%)'), '70');
    await user.click(screen.getByRole('button', { name: 'Add setup' }));

    await waitFor(() => expect(onSaved).toHaveBeenCalled());
    expect(requests[0].body).toEqual({
      name: 'Deep + shallow',
      boxes: [
        { size: 'deep', honeyFill: 0.5 },
        { size: 'shallow', honeyFill: 0.7 },
      ],
    });
  });

  it('when honey fill is over 100 % then the shared schema message shows and nothing is sent', async () => {
    const { fetchMock } = mockFetch(() => ({ status: 500 }));
    const user = userEvent.setup();
    renderWithProviders(<HiveSetupForm units="metric" onSaved={vi.fn()} onCancel={vi.fn()} />);

    await user.type(screen.getByLabelText('Setup name'), 'Overfull');
    await user.clear(screen.getByLabelText('Box 1 honey fill (%)'));
    await user.type(screen.getByLabelText('Box 1 honey fill (%)'), '120');
    await user.click(screen.getByRole('button', { name: 'Add setup' }));

    expect(await screen.findByText('Honey fill is between 0 and 1.')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('when the only box would be removed then removing is not offered', () => {
    mockFetch(() => ({ status: 500 }));
    renderWithProviders(<HiveSetupForm units="metric" onSaved={vi.fn()} onCancel={vi.fn()} />);
    expect(
      (screen.getByRole('button', { name: 'Remove box 1' }) as HTMLButtonElement).disabled,
    ).toBe(true);
  });
});

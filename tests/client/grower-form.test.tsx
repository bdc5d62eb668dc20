import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { GrowerForm } from '@/features/growers/components/grower-form';
import { apiError, mockFetch, renderWithProviders } from './support';

describe('GrowerForm', () => {
  it('when a contact e-mail is malformed then the shared schema message shows on that contact', async () => {
    const { fetchMock } = mockFetch(() => ({ status: 500 }));
    const user = userEvent.setup();
    renderWithProviders(<GrowerForm onSaved={vi.fn()} />);

    await user.type(screen.getByLabelText('Grower or farm name'), 'Pellwick Family Farms');
    await user.click(screen.getByRole('button', { name: 'Add contact' }));
    await user.type(screen.getByLabelText('Contact 1 name'), 'Dana Pellwick');
    await user.type(screen.getByLabelText('Contact 1 e-mail'), 'dana-at-pellwick');
    await user.click(screen.getByRole('button', { name: 'Add grower' }));

    const contact = screen.getByRole('group', { name: 'Contact 1' });
    expect(await within(contact).findByText('Enter an e-mail address.')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('when the server names contacts.0.phone then the message shows on the first contact', async () => {
    mockFetch(() =>
      apiError(400, 'validation_failed', 'Check these fields: contacts.0.phone.', [
        { field: 'contacts.0.phone', message: 'At most 40 characters.' },
      ]),
    );
    const user = userEvent.setup();
    renderWithProviders(<GrowerForm onSaved={vi.fn()} />);

    await user.type(screen.getByLabelText('Grower or farm name'), 'Pellwick Family Farms');
    await user.click(screen.getByRole('button', { name: 'Add contact' }));
    await user.type(screen.getByLabelText('Contact 1 name'), 'Dana Pellwick');
    await user.type(screen.getByLabelText('Contact 1 phone'), '555-0100');
    await user.click(screen.getByRole('button', { name: 'Add grower' }));

    const contact = screen.getByRole('group', { name: 'Contact 1' });
    expect(await within(contact).findByText('At most 40 characters.')).toBeTruthy();
  });
});

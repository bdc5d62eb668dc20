import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ContractForm } from '@/features/contracts/components/contract-form';
import { apiError, mockFetch, renderWithProviders } from './support';

const growerId = '44444444-4444-4444-8444-444444444444';
const siteId = '55555555-5555-4555-8555-555555555555';
const growers = [{ id: growerId, name: 'Sunfold Almond Ranch' }];
const sites = [{ id: siteId, name: 'Sunfold Block 7', growerId }];

async function fillContract(user: ReturnType<typeof userEvent.setup>) {
  await user.selectOptions(screen.getByLabelText('Grower'), growerId);
  await user.selectOptions(screen.getByLabelText('Crop'), 'almond');
  await user.click(screen.getByRole('checkbox', { name: 'Sunfold Block 7' }));
  await user.type(screen.getByLabelText('Colonies ordered'), '640');
  await user.type(screen.getByLabelText('Minimum frames of bees'), '6');
  await user.type(screen.getByLabelText('Fee per colony ($)'), '215.50');
  await user.type(screen.getByLabelText('Delivery from'), '2027-02-01');
  await user.type(screen.getByLabelText('Delivery by'), '2027-02-08');
}

describe('ContractForm', () => {
  it('when the delivery window ends before it starts then shows the shared rule and sends nothing', async () => {
    const { fetchMock } = mockFetch(() => ({ status: 500 }));
    const user = userEvent.setup();
    renderWithProviders(<ContractForm growers={growers} sites={sites} onSaved={vi.fn()} />);

    await fillContract(user);
    await user.clear(screen.getByLabelText('Delivery by'));
    await user.type(screen.getByLabelText('Delivery by'), '2027-01-20');
    await user.click(screen.getByRole('button', { name: 'Add contract' }));

    expect(await screen.findByText('The delivery window ends on or after it starts.')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('when the fee is typed in dollars then the request carries whole cents', async () => {
    const { requests } = mockFetch(() => ({ status: 201, body: { id: 'c1', version: 1 } }));
    const onSaved = vi.fn();
    const user = userEvent.setup();
    renderWithProviders(<ContractForm growers={growers} sites={sites} onSaved={onSaved} />);

    await fillContract(user);
    await user.click(screen.getByRole('button', { name: 'Add contract' }));

    await waitFor(() => expect(onSaved).toHaveBeenCalled());
    expect(requests[0].body).toMatchObject({
      growerId,
      siteIds: [siteId],
      crop: 'almond',
      coloniesOrdered: 640,
      feePerColonyCents: 21550,
    });
  });

  it('when the fee is not a number then says so', async () => {
    mockFetch(() => ({ status: 500 }));
    const user = userEvent.setup();
    renderWithProviders(<ContractForm growers={growers} sites={sites} onSaved={vi.fn()} />);

    await fillContract(user);
    await user.clear(screen.getByLabelText('Fee per colony ($)'));
    await user.type(screen.getByLabelText('Fee per colony ($)'), 'two hundred');
    await user.click(screen.getByRole('button', { name: 'Add contract' }));

    expect(await screen.findByText('Enter a number.')).toBeTruthy();
  });

  it('when the server names a site field then the message appears by the sites', async () => {
    mockFetch(() =>
      apiError(400, 'validation_failed', 'Check these fields: siteIds.0.', [
        { field: 'siteIds.0', message: 'This site belongs to another grower.' },
      ]),
    );
    const user = userEvent.setup();
    renderWithProviders(<ContractForm growers={growers} sites={sites} onSaved={vi.fn()} />);

    await fillContract(user);
    await user.click(screen.getByRole('button', { name: 'Add contract' }));

    expect(await screen.findByText('This site belongs to another grower.')).toBeTruthy();
    expect((screen.getByLabelText('Colonies ordered') as HTMLInputElement).value).toBe('640');
  });
});

import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { SessionUser } from '@shared/schemas/users';
import { sprayCaution } from '@shared/schemas/spray-notices';
import { SprayNoticeForm } from '@/features/spray-notices/components/spray-notice-form';
import { localToInstant } from '@/features/spray-notices/local-instant';
import { apiError, mockFetch, planner, renderWithProviders } from './support';

const grower: SessionUser = {
  ...planner,
  role: 'grower',
  growerId: '00000000-0000-4000-8000-0000000000bb',
};
const siteId = '11111111-1111-4111-8111-111111111111';
const sites = [
  { id: siteId, name: 'Block 12' },
  { id: '22222222-2222-4222-8222-222222222222', name: 'Block 14' },
];

afterEach(() => vi.unstubAllGlobals());

async function fillValid(user: ReturnType<typeof userEvent.setup>) {
  await user.selectOptions(screen.getByLabelText('Site'), siteId);
  await user.type(screen.getByLabelText('Spraying starts'), '2027-02-20T05:30');
  await user.type(screen.getByLabelText('Spraying ends'), '2027-02-20T09:00');
  await user.type(screen.getByLabelText('Product'), '  Copper fungicide ');
}

describe('SprayNoticeForm', () => {
  it('when the form is filled then the times go out as instants with the browser offset and the caution shows', async () => {
    const { requests } = mockFetch(() => ({ status: 201, body: { id: 'n1', product: 'x' } }));
    const onFiled = vi.fn();
    const user = userEvent.setup();
    renderWithProviders(<SprayNoticeForm sites={sites} onFiled={onFiled} />, { user: grower });

    expect(screen.getByText(sprayCaution)).toBeTruthy();
    await fillValid(user);
    await user.type(screen.getByLabelText('Notes'), 'Rows 1–40 only');
    await user.click(screen.getByRole('button', { name: 'File spray notice' }));

    await waitFor(() => expect(onFiled).toHaveBeenCalled());
    expect(requests[0].url).toBe('/api/spray-notices');
    expect(requests[0].method).toBe('POST');
    expect(requests[0].body).toEqual({
      siteId,
      startsAt: localToInstant('2027-02-20T05:30'),
      endsAt: localToInstant('2027-02-20T09:00'),
      product: 'Copper fungicide',
      notes: 'Rows 1–40 only',
    });
    expect(localToInstant('2027-02-20T05:30')).toMatch(/^2027-02-20T05:30:00[+-]\d{2}:\d{2}$/);
  });

  it('when the fields are empty or the spray ends before it starts then the shared schema names each field and nothing is sent', async () => {
    const { fetchMock } = mockFetch(() => ({ status: 201, body: {} }));
    const user = userEvent.setup();
    renderWithProviders(<SprayNoticeForm sites={sites} />, { user: grower });

    await user.click(screen.getByRole('button', { name: 'File spray notice' }));
    expect(await screen.findByText('Choose a site.')).toBeTruthy();
    expect(screen.getAllByText('Choose a date and time.')).toHaveLength(2);
    expect(screen.getByText('Name the product.')).toBeTruthy();

    await user.selectOptions(screen.getByLabelText('Site'), siteId);
    await user.type(screen.getByLabelText('Spraying starts'), '2027-02-20T09:00');
    await user.type(screen.getByLabelText('Spraying ends'), '2027-02-20T05:00');
    await user.type(screen.getByLabelText('Product'), 'Copper');
    await user.click(screen.getByRole('button', { name: 'File spray notice' }));
    expect(await screen.findByText('The spray ends after it starts.')).toBeTruthy();
    expect(screen.getByLabelText('Spraying ends').getAttribute('aria-invalid')).toBe('true');

    await user.clear(screen.getByLabelText('Spraying ends'));
    await user.type(screen.getByLabelText('Spraying ends'), '2027-03-20T05:00');
    await user.click(screen.getByRole('button', { name: 'File spray notice' }));
    expect(await screen.findByText('One notice covers at most 14 days.')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('when the server answers 400 then its issues land on the named fields', async () => {
    mockFetch(() =>
      apiError(400, 'validation_failed', 'Some fields need another look.', [
        { field: 'siteId', message: 'No such site.' },
        { field: 'product', message: 'Too long.' },
      ]),
    );
    const user = userEvent.setup();
    renderWithProviders(<SprayNoticeForm sites={sites} />, { user: grower });
    await fillValid(user);
    await user.click(screen.getByRole('button', { name: 'File spray notice' }));

    expect(await screen.findByText('No such site.')).toBeTruthy();
    expect(screen.getByText('Too long.')).toBeTruthy();
    expect(screen.getByLabelText('Site').getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByText('Some fields need another look.')).toBeTruthy();
  });
});

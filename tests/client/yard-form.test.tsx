import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import type { YardView } from '@shared/schemas/yards';
import { YardForm } from '@/features/yards/components/yard-form';
import { apiError, mockFetch, renderWithProviders } from './support';

const yard: YardView = {
  id: '11111111-1111-4111-8111-111111111111',
  name: 'Tecolote Draw',
  latitude: 28.4123,
  longitude: -98.6371,
  capacity: 500,
  accessNotes: 'Gate code 4417.',
  notes: '',
  lastVisitOn: '2026-12-09',
  version: 3,
  archivedAt: null,
  colonies: 442,
  coloniesBySetup: [],
};

async function fillNewYard(user: ReturnType<typeof userEvent.setup>) {
  await user.type(screen.getByLabelText('Yard name'), 'Mesquite Corner');
  await user.type(screen.getByLabelText('Latitude'), '28.5');
  await user.type(screen.getByLabelText('Longitude'), '-98.2');
  await user.type(screen.getByLabelText('Capacity (colonies)'), '320');
}

describe('YardForm', () => {
  it('when submitted empty then shows the shared schema messages and sends nothing', async () => {
    const { fetchMock } = mockFetch(() => ({ status: 500 }));
    const user = userEvent.setup();
    renderWithProviders(<YardForm onSaved={vi.fn()} />);

    await user.click(screen.getByRole('button', { name: 'Add yard' }));

    expect(await screen.findAllByText('Required.')).toHaveLength(4); // name, latitude, longitude, capacity
    expect(screen.getByLabelText('Yard name').getAttribute('aria-invalid')).toBe('true');
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('when latitude is out of range then shows the range message from the shared schema', async () => {
    mockFetch(() => ({ status: 500 }));
    const user = userEvent.setup();
    renderWithProviders(<YardForm onSaved={vi.fn()} />);

    await fillNewYard(user);
    await user.clear(screen.getByLabelText('Latitude'));
    await user.type(screen.getByLabelText('Latitude'), '95');
    await user.click(screen.getByRole('button', { name: 'Add yard' }));

    expect(await screen.findByText('Latitude is between -90 and 90.')).toBeTruthy();
  });

  it('when valid then posts numbers with the CSRF header and reports the saved yard', async () => {
    const { requests } = mockFetch(() => ({
      status: 201,
      body: { ...yard, name: 'Mesquite Corner' },
    }));
    const onSaved = vi.fn();
    const user = userEvent.setup();
    renderWithProviders(<YardForm onSaved={onSaved} />);

    await fillNewYard(user);
    await user.click(screen.getByRole('button', { name: 'Add yard' }));

    await waitFor(() => expect(onSaved).toHaveBeenCalledTimes(1));
    const post = requests.find((r) => r.method === 'POST')!;
    expect(post.url).toBe('/api/yards');
    expect(post.headers['X-CSRF-Token']).toBe('test-csrf-token');
    expect(post.body).toMatchObject({
      name: 'Mesquite Corner',
      latitude: 28.5,
      longitude: -98.2,
      capacity: 320,
      lastVisitOn: null,
    });
  });

  it('when the server refuses with field details then each message shows on its field and the input stays', async () => {
    mockFetch(() =>
      apiError(400, 'validation_failed', 'Check these fields: name.', [
        { field: 'name', message: 'A yard of this name exists.' },
      ]),
    );
    const user = userEvent.setup();
    renderWithProviders(<YardForm onSaved={vi.fn()} />);

    await fillNewYard(user);
    await user.click(screen.getByRole('button', { name: 'Add yard' }));

    expect(await screen.findByText('A yard of this name exists.')).toBeTruthy();
    expect(screen.getByLabelText('Yard name').getAttribute('aria-invalid')).toBe('true');
    expect((screen.getByLabelText('Yard name') as HTMLInputElement).value).toBe('Mesquite Corner');
    expect((screen.getByLabelText('Capacity (colonies)') as HTMLInputElement).value).toBe('320');
  });

  it('when someone else saved first (409) then explains, offers a reload and keeps what was typed', async () => {
    const { requests } = mockFetch(() =>
      apiError(409, 'version_conflict', 'Someone else changed this record since you opened it.'),
    );
    const onReload = vi.fn().mockResolvedValue(undefined);
    const user = userEvent.setup();
    renderWithProviders(<YardForm yard={yard} onSaved={vi.fn()} onReload={onReload} />);

    await user.clear(screen.getByLabelText('Capacity (colonies)'));
    await user.type(screen.getByLabelText('Capacity (colonies)'), '520');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    expect(
      await screen.findByText('Someone else saved this record while you were editing.'),
    ).toBeTruthy();
    expect(requests.find((r) => r.method === 'PATCH')!.body).toMatchObject({
      version: 3,
      capacity: 520,
    });
    await user.click(screen.getByRole('button', { name: 'Reload latest version' }));
    expect(onReload).toHaveBeenCalledTimes(1);
    await waitFor(() =>
      expect(
        screen.queryByText('Someone else saved this record while you were editing.'),
      ).toBeNull(),
    );
    expect((screen.getByLabelText('Capacity (colonies)') as HTMLInputElement).value).toBe('520');
  });
});

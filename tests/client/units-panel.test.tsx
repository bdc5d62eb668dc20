import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { UnitsPanel } from '@/features/settings/components/units-panel';
import { sessionKeys, type SessionResponse } from '@/lib/auth';
import { apiError, mockFetch, planner, renderWithProviders } from './support';

describe('UnitsPanel', () => {
  it('when metric is chosen then the session switches at once and the preference is saved', async () => {
    const { requests } = mockFetch(() => ({
      status: 200,
      body: { user: { ...planner, units: 'metric' } },
    }));
    const user = userEvent.setup();
    const { queryClient } = renderWithProviders(<UnitsPanel />);

    await user.click(screen.getByLabelText(/Metric/));

    expect(queryClient.getQueryData<SessionResponse>(sessionKeys.all)?.user?.units).toBe('metric');
    await waitFor(() => expect(requests).toHaveLength(1));
    expect(requests[0]).toMatchObject({
      method: 'PUT',
      url: '/api/session/preferences',
      body: { units: 'metric' },
    });
    expect(await screen.findByText('Units set to metric.')).toBeTruthy();
  });

  it('when saving fails then the choice goes back to what it was', async () => {
    mockFetch(() => apiError(500, 'internal', 'Something went wrong.'));
    const user = userEvent.setup();
    const { queryClient } = renderWithProviders(<UnitsPanel />);

    await user.click(screen.getByLabelText(/Metric/));

    await waitFor(() =>
      expect(queryClient.getQueryData<SessionResponse>(sessionKeys.all)?.user?.units).toBe(
        'imperial',
      ),
    );
    expect((screen.getByLabelText(/Imperial/) as HTMLInputElement).checked).toBe(true);
  });
});

import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { WeightSampleForm } from '@/features/samples/components/weight-sample-form';
import { todayIso } from '@/lib/units';
import { apiError, mockFetch, renderWithProviders } from './support';

const yardId = '22222222-2222-4222-8222-222222222222';
const lotId = '33333333-3333-4333-8333-333333333333';
const lots = [{ id: lotId, name: 'Two-deep winter lot', coloniesHere: 120 }];
// Exact: the international pound is 0.45359237 kg (NIST SP 811).
const KG_PER_LB = 0.45359237;

const created = { status: 201, body: { id: 'w1' } };

describe('WeightSampleForm', () => {
  it('when weights are typed in lb across commas, spaces and lines then kg are sent for this yard and lot', async () => {
    const { requests } = mockFetch(() => created);
    const onRecorded = vi.fn();
    const user = userEvent.setup();
    renderWithProviders(
      <WeightSampleForm
        yardId={yardId}
        yardName="Tecolote Draw"
        lots={lots}
        units="imperial"
        onRecorded={onRecorded}
      />,
    );

    await user.type(screen.getByLabelText('Hive weights (lb)'), '100, 200{Enter}150.5  120');
    await user.click(screen.getByRole('button', { name: 'Record weights' }));

    await waitFor(() =>
      expect(onRecorded).toHaveBeenCalledWith('4 hive weights recorded at Tecolote Draw.'),
    );
    expect(requests).toHaveLength(1);
    expect(requests[0].method).toBe('POST');
    expect(requests[0].url).toBe('/api/weight-samples');
    const body = requests[0].body as { weightsKg: number[] };
    expect(body).toMatchObject({ yardId, lotId, sampledOn: todayIso(), notes: '' });
    expect(body.weightsKg).toHaveLength(4);
    [100, 200, 150.5, 120].forEach((lb, i) =>
      expect(body.weightsKg[i]).toBeCloseTo(lb * KG_PER_LB, 9),
    );
    expect(body.weightsKg[0]).toBe(45.359237);
  });

  it('when the user works in kg then the weights are sent as typed', async () => {
    const { requests } = mockFetch(() => created);
    const user = userEvent.setup();
    renderWithProviders(
      <WeightSampleForm
        yardId={yardId}
        yardName="Tecolote Draw"
        lots={lots}
        units="metric"
        onRecorded={vi.fn()}
      />,
    );

    await user.type(screen.getByLabelText('Hive weights (kg)'), '52.5;61 48');
    await user.selectOptions(screen.getByLabelText('Colony lot'), 'Mixed or not known');
    await user.click(screen.getByRole('button', { name: 'Record weights' }));

    await waitFor(() => expect(requests).toHaveLength(1));
    expect(requests[0].body).toMatchObject({ weightsKg: [52.5, 61, 48], lotId: null });
  });

  it('when some entries are not numbers then they are named on the field and nothing is sent', async () => {
    const { fetchMock } = mockFetch(() => created);
    const user = userEvent.setup();
    renderWithProviders(
      <WeightSampleForm yardId={yardId} yardName="Tecolote Draw" lots={lots} units="imperial" />,
    );

    await user.type(screen.getByLabelText('Hive weights (lb)'), '120 1O8 x, 131');
    await user.click(screen.getByRole('button', { name: 'Record weights' }));

    expect(await screen.findByText(/^Not numbers: "1O8", "x"\./)).toBeTruthy();
    expect(screen.getByLabelText('Hive weights (lb)').getAttribute('aria-invalid')).toBe('true');
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('when only one hive is weighed then it asks for two, since the spread needs them', async () => {
    const { fetchMock } = mockFetch(() => created);
    const user = userEvent.setup();
    renderWithProviders(
      <WeightSampleForm yardId={yardId} yardName="Tecolote Draw" lots={lots} units="imperial" />,
    );

    await user.type(screen.getByLabelText('Hive weights (lb)'), '120');
    await user.click(screen.getByRole('button', { name: 'Record weights' }));

    expect(await screen.findByText(/Weigh at least two hives/)).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('when a weight in lb is over the schema limit in kg then that reading is named as typed', async () => {
    const { fetchMock } = mockFetch(() => created);
    const user = userEvent.setup();
    renderWithProviders(
      <WeightSampleForm yardId={yardId} yardName="Tecolote Draw" lots={lots} units="imperial" />,
    );

    // 600 lb is 272 kg, over the shared schema's 250 kg.
    await user.type(screen.getByLabelText('Hive weights (lb)'), '120 600 131');
    await user.click(screen.getByRole('button', { name: 'Record weights' }));

    expect(
      await screen.findByText('Reading 2 (600 lb): A hive weighs at most 250 kg.'),
    ).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('when the server refuses weightsKg.0 (400) then the message shows on the readings field', async () => {
    mockFetch(() =>
      apiError(400, 'validation_failed', 'The request has problems.', [
        { field: 'weightsKg.0', message: 'A hive weighs more than 0.' },
        { field: 'sampledOn', message: 'This date does not exist.' },
      ]),
    );
    const onRecorded = vi.fn();
    const user = userEvent.setup();
    renderWithProviders(
      <WeightSampleForm
        yardId={yardId}
        yardName="Tecolote Draw"
        lots={lots}
        units="imperial"
        onRecorded={onRecorded}
      />,
    );

    await user.type(screen.getByLabelText('Hive weights (lb)'), '120 131');
    await user.click(screen.getByRole('button', { name: 'Record weights' }));

    const readings = screen.getByLabelText('Hive weights (lb)');
    expect(await screen.findByText('Reading 1 (120 lb): A hive weighs more than 0.')).toBeTruthy();
    await waitFor(() => expect(readings.getAttribute('aria-invalid')).toBe('true'));
    expect(readings.getAttribute('aria-describedby')).toContain('error');
    expect(screen.getByText('This date does not exist.')).toBeTruthy();
    expect(screen.getByText('Some fields need another look.')).toBeTruthy();
    expect(onRecorded).not.toHaveBeenCalled();
  });

  it('when the server names a field the form does not hold then it shows above the form', async () => {
    mockFetch(() =>
      apiError(400, 'validation_failed', 'The request has problems.', [
        { field: 'yardId', message: 'No such yard.' },
      ]),
    );
    const user = userEvent.setup();
    renderWithProviders(
      <WeightSampleForm yardId={yardId} yardName="Tecolote Draw" lots={lots} units="metric" />,
    );

    await user.type(screen.getByLabelText('Hive weights (kg)'), '52 61');
    await user.click(screen.getByRole('button', { name: 'Record weights' }));

    expect(await screen.findByText(/No such yard\./)).toBeTruthy();
  });
});

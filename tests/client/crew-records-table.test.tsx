import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { CrewRecordsTable } from '@/features/moves/components/crew-records-table';
import { nothingRecorded } from '@shared/schemas/moves';
import type { LoadSheetPage } from '@/features/moves/types';

const yardA = '33333333-3333-4333-8333-333333333333';
const yardB = '44444444-4444-4444-8444-444444444444';
const lot = '55555555-5555-4555-8555-555555555555';

const stop = (yardId: string, yardName: string, pallets: number) => ({
  pickupOrder: yardId === yardA ? 1 : 2,
  yardId,
  yardName,
  lotId: lot,
  lotName: 'Doubles',
  pallets,
  colonies: pallets * 4,
  latitude: null,
  longitude: null,
  accessNotes: '',
  timeZone: null,
  civilDusk: null,
});

// Only what the table reads of a load-sheet page.
const page = {
  page: 1,
  key: 'truck-1',
  loadId: '22222222-2222-4222-8222-222222222222',
  truckName: 'Rig Amber',
  pallets: 18,
  stops: [stop(yardA, 'Dry Fork', 12), stop(yardB, 'Salt Lick', 6)],
  recorded: {
    palletsLoaded: 17,
    palletsByStop: [
      { yardId: yardA, lotId: lot, pallets: 12 },
      { yardId: yardB, lotId: lot, pallets: 5 },
    ],
    coloniesPlaced: 64,
    coloniesLeftBehind: 4,
    leftBehindByStop: [
      { yardId: yardA, lotId: lot, colonies: 0 },
      { yardId: yardB, lotId: lot, colonies: 4 },
    ],
    coloniesLost: 0,
    placements: null,
    preRollCheck: null,
    notes: '',
    version: 4,
  },
} as unknown as LoadSheetPage;

describe('Crew records by truck and yard', () => {
  it('when colonies were left behind at one yard then that yard says so and the other does not', () => {
    render(<CrewRecordsTable pages={[page]} />);
    const table = screen.getByRole('table', { name: 'Crew records' });
    const row = (yard: string) => table.querySelector(`[data-crew-stop="${yard}"]`) as HTMLElement;
    expect(within(row('Salt Lick')).getByTestId('stop-left-behind').textContent).toBe(
      '4 left in this yard',
    );
    expect(within(row('Dry Fork')).getByTestId('stop-left-behind').textContent).toBe('');
    expect(within(row('Salt Lick')).getAllByRole('cell')[2].textContent).toBe('5');
    expect(table.textContent).toContain('64 · 4 · 0');
  });
  it('when a truck has no saved load yet then its row shows nothing recorded instead of failing', () => {
    render(<CrewRecordsTable pages={[{ ...page, loadId: null, recorded: null }]} />);
    const truck = screen
      .getByRole('table', { name: 'Crew records' })
      .querySelector('[data-crew-truck="Rig Amber"]') as HTMLElement;
    expect(within(truck).getByTestId('truck-loaded').textContent).toBe('—');
    expect(truck.textContent).toContain('Not kept');
    expect(truck.textContent).toContain('— · — · —');
  });
  it('when a one-stop truck has only a truck total then its yard row shows it', () => {
    const oneStop = {
      ...page,
      stops: [page.stops[0]],
      recorded: { ...nothingRecorded, palletsLoaded: 11, coloniesLeftBehind: 3 },
    };
    render(<CrewRecordsTable pages={[oneStop]} />);
    const row = screen
      .getByRole('table', { name: 'Crew records' })
      .querySelector('[data-crew-stop="Dry Fork"]') as HTMLElement;
    expect(within(row).getAllByRole('cell')[2].textContent).toBe('11');
    expect(within(row).getByTestId('stop-left-behind').textContent).toBe('3 left in this yard');
  });
});

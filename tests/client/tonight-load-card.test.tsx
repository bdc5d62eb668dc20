import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { LoadCard } from '@/features/tonight/components/load-card';
import { OfflineQueue, type SendChanges } from '@/features/tonight/lib/offline-queue';
import { memoryStorage } from '@/features/tonight/lib/storage';
import type { NewChange } from '@/features/tonight/lib/offline-queue';
import type { LoadRecord, TonightLoad, TonightMove } from '@/features/tonight/types';
import { nothingRecorded } from '@shared/schemas/moves';
import { renderWithProviders } from './support';

const yardA = '33333333-3333-4333-8333-333333333333';
const yardB = '44444444-4444-4444-8444-444444444444';
const lotA = '55555555-5555-4555-8555-555555555555';
const lotB = '66666666-6666-4666-8666-666666666666';

const stop = (yardId: string, yardName: string, lotId: string, pallets: number) => ({
  pickupOrder: yardId === yardA ? 1 : 2,
  latitude: null,
  longitude: null,
  yardId,
  yardName,
  lotId,
  lotName: 'Two deeps',
  pallets,
  colonies: pallets * 4,
  accessNotes: '',
  civilDusk: null,
  timeZone: 'America/Chicago',
});

function card(recorded: Partial<LoadRecord> = {}, times: Partial<TonightLoad> = {}) {
  const load: TonightLoad = {
    loadId: '22222222-2222-4222-8222-222222222222',
    key: 'truck-1',
    truckName: 'Rig Amber',
    driverNames: ['Ola Venn'],
    pallets: 18,
    colonies: 72,
    departure: null,
    arrival: null,
    stops: [stop(yardA, 'Dry Fork', lotA, 12), stop(yardB, 'Salt Lick', lotB, 6)],
    recorded: { ...nothingRecorded, version: 3, ...recorded },
    ...times,
  };
  const move: TonightMove = {
    id: '11111111-1111-4111-8111-111111111111',
    name: 'Run north',
    nightOf: '2027-02-01',
    status: 'loading',
    version: 5,
    destinations: [],
    loads: [load],
    cautions: [],
  };
  const onChange = vi.fn<(change: NewChange) => void>();
  renderWithProviders(<LoadCard move={move} load={load} units="imperial" onChange={onChange} />);
  return onChange;
}

describe('Tonight load card', () => {
  it('when the crew counts a pallet at the second yard then the change carries every stop and their sum', async () => {
    const onChange = card({
      palletsLoaded: 5,
      palletsByStop: [{ yardId: yardA, lotId: lotA, pallets: 5 }],
    });
    expect(screen.getByTestId('pallets-loaded').textContent).toBe('Pallets loaded: 5 of 18');
    await userEvent.click(
      screen.getByRole('button', { name: 'Pallets loaded at Salt Lick on Rig Amber: one more' }),
    );
    expect(onChange).toHaveBeenCalledWith(
      expect.objectContaining({
        kind: 'load-counts',
        baseVersion: 3,
        payload: {
          palletsByStop: [
            { yardId: yardA, lotId: lotA, pallets: 5 },
            { yardId: yardB, lotId: lotB, pallets: 1 },
          ],
          palletsLoaded: 6,
        },
        label: 'Rig Amber: 1 pallet loaded at Salt Lick',
      }),
    );
  });

  it('when only a truck total was recorded on a two-stop truck then the crew is told counting by yard replaces it', () => {
    card({ palletsLoaded: 9 });
    expect(screen.getByTestId('pallets-loaded').textContent).toBe('Pallets loaded: 9 of 18');
    expect(screen.getByText(/9 were recorded for the whole truck/)).toBeTruthy();
  });

  it('when the crew leaves colonies behind at the second yard then the change carries them per stop and their sum', async () => {
    const onChange = card();
    await userEvent.click(screen.getByText('Placed, left behind, lost'));
    expect(screen.queryByLabelText('Left behind')).toBeNull();
    await userEvent.type(screen.getByLabelText('Left behind at Salt Lick'), '4');
    await userEvent.type(screen.getByLabelText('Lost on the road'), '1');
    await userEvent.click(screen.getByRole('button', { name: 'Keep placed counts' }));
    expect(onChange.mock.calls[0][0].payload).toMatchObject({
      coloniesLeftBehind: 4,
      leftBehindByStop: [
        { yardId: yardA, lotId: lotA, colonies: 0 },
        { yardId: yardB, lotId: lotB, colonies: 4 },
      ],
      coloniesLost: 1,
    });
  });

  it('when only a truck total was left behind on a two-stop truck then the crew is told giving it by yard replaces it', async () => {
    const onChange = card({ coloniesLeftBehind: 2 });
    expect(screen.getByText(/2 were recorded as left behind for the whole truck/)).toBeTruthy();
    await userEvent.click(screen.getByText('Placed, left behind, lost'));
    await userEvent.click(screen.getByRole('button', { name: 'Keep placed counts' }));
    // Nothing given per yard: the truck's total stands (neither field is sent); nothing typed at
    // a drop: the placed counts are not sent as zero either.
    const change = onChange.mock.calls[0][0];
    expect(Object.keys(change.payload)).toEqual(['coloniesLost']);
    expect(change.label).toBe('Rig Amber: left behind and lost');
  });

  it("when the truck has planned times then they read on each place's clock, as on the printed sheet", () => {
    card({}, { departure: '2027-02-01T21:40:00-06:00', arrival: '2027-02-02T04:05:00-08:00' });
    expect(screen.getByText(/^Planned: rolls/).textContent).toBe(
      'Planned: rolls Mon 9:40 PM CST (UTC−6), arrives Tue 4:05 AM (UTC−8).',
    );
  });

  it('when the crew keeps the pre-roll check then the ticked items and the time go with it', async () => {
    const onChange = card();
    expect(screen.getByText('· not done')).toBeTruthy();
    await userEvent.click(screen.getByText('Pre-roll check'));
    await userEvent.click(screen.getByLabelText('Nets on and clipped down'));
    await userEvent.click(screen.getByLabelText('Straps tight on every tier'));
    await userEvent.click(screen.getByRole('button', { name: 'Keep the check' }));
    const change = onChange.mock.calls[0][0];
    expect(change.label).toBe('Rig Amber: pre-roll check, 2 of 5 ticked');
    expect(change.payload.preRollCheck).toMatchObject({
      netsClipped: true,
      strapsTight: true,
      palletsClean: false,
      waterAboard: false,
      certificateInCab: false,
    });
    expect(Date.parse((change.payload.preRollCheck as { checkedAt: string }).checkedAt)).not.toBe(
      NaN,
    );
  });
});

describe('Tonight queue on a shared phone', () => {
  it('when the device is forgotten then its changes and snapshots are gone', async () => {
    const storage = memoryStorage();
    const queue = new OfflineQueue(storage, vi.fn());
    await queue.enqueue({
      kind: 'note',
      moveId: '11111111-1111-4111-8111-111111111111',
      payload: { text: 'gate chained' },
      label: 'a note',
    });
    await storage.saveSnapshot('2027-02-01', {
      fetchedAt: '2027-02-01T20:00:00Z',
      nights: ['2027-02-01'],
      upcoming: false,
      moves: [],
    });
    expect(await queue.unsent()).toBe(1);
    await queue.forgetAll();
    expect(await queue.unsent()).toBe(0);
    expect(await storage.listChanges()).toEqual([]);
    expect(await storage.loadSnapshot('2027-02-01')).toBeUndefined();
  });
  it("when another person signs in on the phone then the first one's changes are kept but not sent as them", async () => {
    const send = vi.fn<SendChanges>(async (changes) => ({
      results: changes.map((c, index) => ({
        index,
        idempotencyKey: c.idempotencyKey,
        kind: c.kind,
        moveId: c.moveId,
        loadId: null,
        outcome: 'applied' as const,
        status: 200,
        record: {},
      })),
    }));
    const queue = new OfflineQueue(memoryStorage(), send);
    const note = (text: string) => ({
      kind: 'note' as const,
      moveId: '11111111-1111-4111-8111-111111111111',
      payload: { text },
      label: text,
    });
    queue.setUser('crew-a');
    await queue.enqueue(note('made by A'));
    queue.setUser('crew-b');
    await queue.enqueue(note('made by B'));
    await queue.sync();
    expect(send.mock.calls.flatMap(([changes]) => changes.map((c) => c.payload.text))).toEqual([
      'made by B',
    ]);
    const [left] = queue.getState().changes;
    expect(left).toMatchObject({ label: 'made by A', madeBy: 'crew-a', state: 'waiting' });
    expect(queue.isOthers(left)).toBe(true);
    // Back as A, it goes.
    queue.setUser('crew-a');
    await queue.sync();
    expect(send.mock.calls.at(-1)![0].map((c) => c.payload.text)).toEqual(['made by A']);
    expect(queue.getState().changes).toEqual([]);
  });
});

import { fireEvent, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { MovePlanner } from '@/features/moves/components/move-planner';
import type { PlannerChoices } from '@/features/moves/components/planner-choices';
import type { MovePlan } from '@/features/moves/types';
import { mockFetch, renderWithProviders } from './support';

const ids = {
  site: '11111111-1111-4111-8111-111111111111',
  grower: '22222222-2222-4222-8222-222222222222',
  yardA: '33333333-3333-4333-8333-333333333333',
  yardB: '44444444-4444-4444-8444-444444444444',
  lot: '55555555-5555-4555-8555-555555555555',
  truck1: '66666666-6666-4666-8666-666666666666',
  truck2: '77777777-7777-4777-8777-777777777777',
};

const choices: PlannerChoices = {
  sites: [{ id: ids.site, name: 'Quail Run Block 3', growerId: ids.grower, crop: 'almond' }],
  yards: [],
  growers: [{ id: ids.grower, name: 'Quail Run Orchards' }],
  contracts: [],
  trucks: [
    { id: ids.truck1, name: 'Rig Amber', payloadKg: 21000, palletSpots: 24, tiers: 2 },
    { id: ids.truck2, name: 'Rig Cobalt', payloadKg: 21000, palletSpots: 24, tiers: 2 },
  ],
};

const truck = (key: string, name: string, yardName: string, pallets: number) => ({
  key,
  truckId: key === 'load-0' ? ids.truck1 : ids.truck2,
  truckName: name,
  driverNames: [],
  payloadKg: 21000,
  palletSpots: 24,
  tiers: 2,
  tareKg: 15000,
  pallets,
  colonies: pallets * 4,
  weightKg: pallets * 240,
  weightUpperKg: pallets * 250,
  payloadUsedPercent: 55,
  payloadUsedUpperPercent: 104,
  gross: { grossKg: 36000, legalGrossKg: 36287, marginKg: 287, withinLimit: true },
  stops: [
    {
      pickupOrder: 0,
      yardId: ids.yardA,
      yardName,
      lotId: ids.lot,
      lotName: 'Spring splits',
      pallets,
      colonies: pallets * 4,
    },
  ],
  departure: '2027-01-26T20:34:00-06:00',
  arrival: '2027-01-27T05:10:00-08:00',
  civilDawn: '2027-01-27T06:39:00-08:00',
  arrivesBeforeDawn: true,
  arrivesInDarkness: true,
});

const plan: MovePlan = {
  nightOf: '2027-01-26',
  loadSheet: {
    palletTareKg: 20,
    trucks: [
      truck('load-0', 'Rig Amber', 'Bobcat Wash', 48),
      truck('load-1', 'Rig Cobalt', 'Yucca Flat', 20),
    ],
    origins: [],
    totals: {
      colonies: 272,
      loadedColonies: 272,
      leftBehindColonies: 0,
      pallets: 68,
      weightKg: 16320,
      weightUpperKg: 17000,
      trucksUsed: 2,
    },
  },
  timeline: {
    from: { yardId: ids.yardA, yardName: 'Bobcat Wash' },
    to: { kind: 'site', id: ids.site, name: 'Quail Run Block 3' },
    window: {
      origin: {
        timeZone: 'America/Chicago',
        sunset: '2027-01-26T18:09:00-06:00',
        civilDusk: '2027-01-26T18:34:00-06:00',
      },
      destination: {
        timeZone: 'America/Los_Angeles',
        civilDawn: '2027-01-27T06:39:00-08:00',
        sunrise: null,
      },
      loadingStart: '2027-01-26T18:34:00-06:00',
      departure: '2027-01-26T20:34:00-06:00',
      arrival: '2027-01-27T05:10:00-08:00',
      distanceKm: 900,
      driveMinutes: 636,
      restMinutes: 0,
      arrivesBeforeDawn: true,
      latestDepartureForDawn: null,
      legs: [],
      notes: [],
    },
    arrivesInDarkness: true,
    originDusk: [],
  },
  warnings: [
    {
      code: 'over-payload',
      severity: 'danger',
      message: 'Rig Amber is over its payload at the upper bound.',
      truckKey: 'load-0',
    },
    {
      code: 'contract-not-agreed',
      severity: 'warning',
      message: 'The contract is not agreed yet.',
    },
  ],
  cautions: [{ code: 'lifting', message: 'Lift full hives with the loader.' }],
  assumptions: [],
};

const availability = {
  nightOf: '2027-01-26',
  items: [
    {
      yardId: ids.yardA,
      yardName: 'Bobcat Wash',
      lotId: ids.lot,
      lotName: 'Spring splits',
      inLedger: 300,
      canLeave: 300,
      promised: 100,
      free: 200,
      promisedTo: [],
    },
    {
      yardId: ids.yardB,
      yardName: 'Yucca Flat',
      lotId: ids.lot,
      lotName: 'Spring splits',
      inLedger: 90,
      canLeave: 90,
      promised: 0,
      free: 90,
      promisedTo: [],
    },
  ],
};

describe('MovePlanner', () => {
  it('when colonies, a site and trucks are chosen then the live load sheet, timeline and warnings of the preview show', async () => {
    const { requests } = mockFetch((request) => {
      if (request.url.startsWith('/api/moves/availability'))
        return { status: 200, body: availability };
      if (request.url === '/api/moves/preview') return { status: 200, body: plan };
      return { status: 404 };
    });
    const user = userEvent.setup();
    renderWithProviders(
      <MovePlanner
        choices={choices}
        units="imperial"
        defaultNight="2027-01-26"
        onSaved={vi.fn()}
      />,
    );

    await user.click(screen.getByLabelText(/Quail Run Block 3/));
    await user.type(
      await screen.findByLabelText('Colonies from Bobcat Wash, Spring splits'),
      '150',
    );
    await user.type(screen.getByLabelText('Colonies from Yucca Flat, Spring splits'), '120');
    await user.click(screen.getByLabelText(/Rig Amber/));
    await user.click(screen.getByLabelText(/Rig Cobalt/));

    const sheet = await screen.findByRole('table', { name: 'Load sheet' });
    expect(
      within(sheet)
        .getAllByRole('row')
        .filter((r) => r.hasAttribute('data-truck-row')),
    ).toHaveLength(2);
    expect(within(sheet).getByText('Rig Amber')).toBeTruthy();
    expect(within(sheet).getByText(/48 pallets/)).toBeTruthy();
    // Weights in the user's units: 11,520 kg is 25,397 lb.
    expect(within(sheet).getByText('25,397 lb')).toBeTruthy();

    const warnings = screen.getByRole('list', { name: 'Warnings' });
    expect(within(warnings).getByText(/over its payload/)).toBeTruthy();
    expect(within(warnings).getByText(/not agreed/)).toBeTruthy();
    expect(
      screen.getByText(/Tue 8:34 PM CST \(UTC−6\)/, {
        selector: '[data-timeline-label="Departure"]',
      }),
    ).toBeTruthy();

    // Typing more than is free is capped; the preview body carries the pick-up order.
    await user.clear(screen.getByLabelText('Colonies from Yucca Flat, Spring splits'));
    await user.type(screen.getByLabelText('Colonies from Yucca Flat, Spring splits'), '500');
    expect(
      (screen.getByLabelText('Colonies from Yucca Flat, Spring splits') as HTMLInputElement).value,
    ).toBe('90');
    await vi.waitFor(
      () => {
        const previews = requests.filter((r) => r.url === '/api/moves/preview');
        const last = previews.at(-1)!.body as {
          origins: Array<{ colonies: number }>;
          loads: unknown[];
        };
        expect(last.origins.map((o) => o.colonies)).toEqual([150, 90]);
        expect(last.loads).toHaveLength(2);
      },
      { timeout: 8_000 },
    );
  });

  it('when the inputs change quickly then one preview is asked for once they settle', async () => {
    const { requests } = mockFetch((request) =>
      request.url.startsWith('/api/moves/availability')
        ? { status: 200, body: availability }
        : { status: 200, body: plan },
    );
    const user = userEvent.setup();
    renderWithProviders(
      <MovePlanner choices={choices} units="metric" defaultNight="2027-01-26" onSaved={vi.fn()} />,
    );
    await user.click(screen.getByLabelText(/Quail Run Block 3/));
    const colonies = await screen.findByLabelText('Colonies from Bobcat Wash, Spring splits');
    // Three keystrokes in one burst (synchronous, so a busy machine cannot spread them out).
    for (const value of ['1', '12', '123']) fireEvent.change(colonies, { target: { value } });
    await screen.findByRole('table', { name: 'Load sheet' }, { timeout: 8_000 });
    const previews = requests.filter((r) => r.url === '/api/moves/preview');
    expect(previews).toHaveLength(1);
    expect((previews[0].body as { origins: Array<{ colonies: number }> }).origins[0].colonies).toBe(
      123,
    );
  });
});

import * as geographiclib from 'geographiclib-geodesic';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInClient, startTestApp, type Client, type TestApp } from '../../../support/test-app';
import { testPassword } from '../../../support/factories';
import { createMoveWorld, moneyKeys, twoYardMove, type MoveWorld } from './move-world';

let t: TestApp;
let w: MoveWorld;
let planner: Client;
let crew: Client;
let grower: Client;

beforeAll(async () => {
  t = await startTestApp();
  w = await createMoveWorld(t.db);
  planner = await signedInClient(t.app, w.planner.email, testPassword);
  crew = await signedInClient(t.app, w.crew.email, testPassword);
  grower = await signedInClient(t.app, w.growerUserA.email, testPassword);
});
afterAll(() => t.close());

interface Truck {
  truckId: string;
  colonies: number;
  pallets: number;
  weightKg: number;
  weightUpperKg: number;
  payloadKg: number;
  gross: { grossKg: number; legalGrossKg: number; withinLimit: boolean };
  stops: Array<{
    yardId: string;
    lotId: string;
    colonies: number;
    pallets: number;
    pickupOrder: number;
  }>;
}

describe('POST /api/moves/preview', () => {
  it('when a two-truck move takes colonies from two yards then the load sheet fits, keeps pick-up order and reconciles', async () => {
    const body = twoYardMove(w);
    const { body: plan } = await planner.post('/api/moves/preview', body).expect(200);
    const trucks: Truck[] = plan.loadSheet.trucks;
    expect(trucks.map((x) => x.truckId)).toEqual([w.truck1, w.truck2]);
    for (const truck of trucks) {
      // DESIGN.md: each truck is planned against its 95 % upper bound, never over payload.
      expect(truck.weightUpperKg).toBeLessThanOrEqual(truck.payloadKg);
      expect(truck.weightUpperKg).toBeGreaterThanOrEqual(truck.weightKg);
      expect(truck.gross.grossKg).toBeCloseTo(15000 + truck.weightUpperKg, 0);
      expect(truck.stops.reduce((s, x) => s + x.colonies, 0)).toBe(truck.colonies);
    }
    // Yard A is picked up first: truck 1 starts there, and no truck visits B before A.
    expect(trucks[0].stops[0].yardId).toBe(w.yardA);
    for (const truck of trucks) {
      const orders = truck.stops.map((s) => s.pickupOrder);
      expect(orders).toEqual([...orders].sort((a, b) => a - b));
    }
    // Totals reconcile: every colony asked for is on a truck or left behind, per yard and overall.
    const totals = plan.loadSheet.totals;
    expect(totals.colonies).toBe(350);
    expect(totals.loadedColonies + totals.leftBehindColonies).toBe(350);
    expect(totals.loadedColonies).toBe(trucks.reduce((s, x) => s + x.colonies, 0));
    expect(totals.pallets).toBe(trucks.reduce((s, x) => s + x.pallets, 0));
    for (const origin of plan.loadSheet.origins) {
      const carried = trucks
        .flatMap((x) => x.stops)
        .filter((s) => s.yardId === origin.yardId && s.lotId === origin.lotId)
        .reduce((s, x) => s + x.colonies, 0);
      expect(carried).toBe(origin.loadedColonies);
      expect(origin.loadedColonies + origin.leftBehindColonies).toBe(origin.colonies);
    }
    // Yard A's weight comes from its weighing; yard B's lot was never weighed.
    const [a, b] = plan.loadSheet.origins;
    expect(a.hiveWeightKg).toMatchObject({ samples: 10, source: { kind: 'yard-sample' } });
    expect(a.hiveWeightKg.mean).toBeCloseTo(59.1, 1);
    expect(b.hiveWeightKg.source.kind).toBe('hive-setup');
    expect(plan.assumptions.join(' ')).toMatch(/no weighed hives/);
    expect(plan.warnings.map((x: { code: string }) => x.code)).toContain('weights-assumed');
  });

  it('when one truck calls at both yards then it drives between them and loads at each before it leaves the last', async () => {
    const { body: plan } = await planner
      .post(
        '/api/moves/preview',
        twoYardMove(w, {
          origins: [
            { yardId: w.yardA, lotId: w.weighedLot, colonies: 40 },
            { yardId: w.yardB, lotId: w.unweighedLot, colonies: 20 },
          ],
        }),
      )
      .expect(200);
    const [truck] = plan.loadSheet.trucks;
    expect(truck.pickups.map((p: { yardId: string }) => p.yardId)).toEqual([w.yardA, w.yardB]);
    const [first, second] = truck.pickups;
    // Reference: geographiclib's WGS84 geodesic between the two yards (27.95 N 97.85 W and
    // 28.3 N 98.1 W), times our road factor of 1.25; the sphere differs by well under 1 %.
    const geodesicKm = geographiclib.Geodesic.WGS84.Inverse(27.95, -97.85, 28.3, -98.1).s12! / 1000;
    expect(second.driveKm / 1.25).toBeCloseTo(geodesicKm, 0);
    expect(second.driveMinutes).toBe(Math.round(((geodesicKm * 1.25) / 85) * 60));
    // Loading at the first yard starts at its dusk; the second after 120 min loading and the drive.
    expect(first.loadingStart).toBe(plan.timeline.originDusk[0].civilDusk);
    const minutesBetween = (a: string, b: string) => (Date.parse(b) - Date.parse(a)) / 60_000;
    expect(minutesBetween(first.loadingStart, second.loadingStart)).toBeCloseTo(
      120 + second.driveMinutes,
      0,
    );
    // It rolls from the last yard after loading there, and the timeline shows this truck's way.
    expect(minutesBetween(second.loadingStart, truck.departure)).toBeCloseTo(120, 0);
    expect(plan.timeline.pickups).toEqual(truck.pickups);
    expect(plan.timeline.window.departure).toBe(truck.departure);
  });

  it('when the contract is only offered and one driver hauls Texas to California then it warns of both', async () => {
    const { body: plan } = await planner.post('/api/moves/preview', twoYardMove(w)).expect(200);
    const codes = plan.warnings.map((x: { code: string }) => x.code);
    expect(codes).toContain('contract-not-agreed');
    expect(codes).toContain('arrives-after-dawn');
    expect(codes).toContain('short-of-order'); // 350 of 400 ordered
    expect(plan.timeline.window.arrivesBeforeDawn).toBe(false);
    // One driver must rest on the way: the truck rolls in by day, with bees flying.
    expect(plan.timeline.arrivesInDarkness).toBe(false);
    expect(plan.timeline.window.distanceKm).toBeGreaterThan(1500);
    // Each time in its own zone: dusk in Texas (UTC−6 in January), dawn in California (UTC−8).
    expect(plan.timeline.originDusk[0].civilDusk).toMatch(/-06:00$/);
    expect(plan.timeline.window.destination.civilDawn).toMatch(/-08:00$/);
    expect(plan.timeline.originDusk.map((d: { yardId: string }) => d.yardId)).toEqual([
      w.yardA,
      w.yardB,
    ]);
    // January: the cold caution, not the heat one; netting and night driving always.
    const cautions = plan.cautions.map((x: { code: string }) => x.code);
    expect(cautions).toEqual(
      expect.arrayContaining(['night-driving', 'netting-ventilation', 'cold-night']),
    );
    expect(cautions).not.toContain('heat-stopped-load');
  });

  it('when the contract is agreed and the colonies fit then neither warning is given', async () => {
    await t.db.query(`UPDATE contracts SET status = 'agreed' WHERE id = $1`, [w.contract]);
    const { body: plan } = await planner
      .post('/api/moves/preview', twoYardMove(w, { drivers: 2 }))
      .expect(200);
    const codes = plan.warnings.map((x: { code: string }) => x.code);
    expect(codes).not.toContain('contract-not-agreed');
    expect(codes).not.toContain('over-payload');
    expect(codes).not.toContain('colonies-not-available');
    await t.db.query(`UPDATE contracts SET status = 'offered' WHERE id = $1`, [w.contract]);
  });

  it('when more colonies are asked than the trucks carry then it warns and leaves them behind', async () => {
    const { body: plan } = await planner
      .post('/api/moves/preview', twoYardMove(w, { loads: [{ truckId: w.truck1 }] }))
      .expect(200);
    expect(plan.loadSheet.totals.leftBehindColonies).toBeGreaterThan(0);
    expect(plan.warnings[0]).toMatchObject({ code: 'over-payload', severity: 'danger' });
  });

  it('when a yard is not the operation’s then 400 names the field; crew and growers get 403', async () => {
    const bad = twoYardMove(w, {
      origins: [
        { yardId: '00000000-0000-4000-8000-000000000000', lotId: w.weighedLot, colonies: 1 },
      ],
    });
    const refused = await planner.post('/api/moves/preview', bad).expect(400);
    expect(refused.body.error.details).toEqual([
      { field: 'origins.0.yardId', message: 'No such yard.' },
    ]);
    await crew.post('/api/moves/preview', twoYardMove(w)).expect(403);
    await grower.post('/api/moves/preview', twoYardMove(w)).expect(403);
  });
});

describe('GET /api/moves/availability', () => {
  it('when another move is planned then its colonies show as promised and the rest as free', async () => {
    const other = (
      await planner
        .post('/api/moves', {
          ...twoYardMove(w, { name: 'Other', nightOf: '2027-01-20', contractId: null }),
          origins: [{ yardId: w.yardA, lotId: w.weighedLot, colonies: 50 }],
          loads: [],
        })
        .expect(201)
    ).body;
    await planner
      .post(`/api/moves/${other.id}/status`, { version: 1, status: 'planned' })
      .expect(200);

    const { body } = await crew.get('/api/moves/availability?nightOf=2027-01-26').expect(200);
    const row = body.items.find((i: { yardId: string }) => i.yardId === w.yardA);
    expect(row).toMatchObject({ inLedger: 300, canLeave: 300, promised: 50, free: 250 });
    expect(row.promisedTo).toEqual([
      expect.objectContaining({ moveId: other.id, colonies: 50, status: 'planned' }),
    ]);
    const except = await planner
      .get(`/api/moves/availability?nightOf=2027-01-26&exceptMoveId=${other.id}`)
      .expect(200);
    expect(except.body.items.find((i: { yardId: string }) => i.yardId === w.yardA)).toMatchObject({
      promised: 0,
      free: 300,
    });

    // The preview uses the same free count: 280 wanted, 250 free.
    const { body: plan } = await planner
      .post(
        '/api/moves/preview',
        twoYardMove(w, { origins: [{ yardId: w.yardA, lotId: w.weighedLot, colonies: 280 }] }),
      )
      .expect(200);
    expect(plan.warnings.map((x: { code: string }) => x.code)).toContain('colonies-not-available');
    await planner
      .post(`/api/moves/${other.id}/status`, { version: 2, status: 'cancelled' })
      .expect(200);
  });

  it('when the night is missing then 400; growers get 403', async () => {
    const refused = await planner.get('/api/moves/availability').expect(400);
    expect(refused.body.error.details[0].field).toBe('nightOf');
    await grower.get('/api/moves/availability?nightOf=2027-01-26').expect(403);
  });
});

describe('saved plan and GET /api/moves/:id/load-sheet', () => {
  it('when a move is saved then it carries its plan, and the load sheet prints it per truck', async () => {
    const { body: move } = await planner.post('/api/moves', twoYardMove(w)).expect(201);
    expect(move.loads).toHaveLength(2);
    expect(
      move.loads.reduce((s: number, l: { coloniesPlanned: number }) => s + l.coloniesPlanned, 0),
    ).toBe(350);
    expect(move.loads[0].plan.truckId).toBe(w.truck1);
    expect(move.timeline.computedAt).toBeTruthy();
    expect(move.timeline.timeline.window.departure).toMatch(/^2027-01-26T/);

    const { body: sheet } = await crew.get(`/api/moves/${move.id}/load-sheet`).expect(200);
    expect(sheet.planSource).toBe('saved');
    expect(sheet.pages.map((p: { page: number }) => p.page)).toEqual([1, 2]);
    expect(sheet.pages[0].driverNames).toEqual(['Test crew']);
    expect(sheet.pages[0].stops[0]).toMatchObject({
      yardName: 'Mesquite Tank',
      accessNotes: 'Gate code 4471; chain on the east gate.',
      timeZone: 'America/Chicago',
    });
    expect(sheet.destinations[0]).toMatchObject({
      name: 'Block 12 North',
      dropMap: { siteId: w.site, drops: 3 },
      grower: {
        name: 'Grower A',
        contacts: [{ name: 'Rosalind Quill', phone: '+1 559 555 0142' }],
      },
    });
    expect(sheet.contract).toMatchObject({ status: 'offered', coloniesOrdered: 400 });
    expect(sheet.cautions.length).toBeGreaterThanOrEqual(3);
    // Crew get no money, and growers none of it.
    expect(moneyKeys(sheet)).toEqual([]);
    await grower.get(`/api/moves/${move.id}/load-sheet`).expect(403);

    // Editing the move recomputes its plan (one truck now: colonies left behind).
    const { body: edited } = await planner
      .patch(`/api/moves/${move.id}`, { version: move.version, loads: [{ truckId: w.truck2 }] })
      .expect(200);
    expect(edited.loads).toHaveLength(1);
    expect(edited.timeline.totals.trucksUsed).toBe(1);
    expect(edited.loads[0].plan.truckId).toBe(w.truck2);
  });

  it('when a move was saved without a plan then the load sheet computes one and says so', async () => {
    const { body: move } = await planner.post('/api/moves', twoYardMove(w)).expect(201);
    await t.db.query(`UPDATE moves SET timeline = NULL WHERE id = $1`, [move.id]);
    const { body: sheet } = await planner.get(`/api/moves/${move.id}/load-sheet`).expect(200);
    expect(sheet.planSource).toBe('computed-now');
    expect(sheet.pages).toHaveLength(2);
  });
});

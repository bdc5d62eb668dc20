/**
 * Move planner benchmark (a plain script): node --import tsx bench/moves.bench.ts
 *
 * 1. The pure plan (load sheet, timelines, warnings) of a 40-truck night from 12 yards, as the
 *    planner page recomputes it on every input change.
 * 2. With DATABASE_URL and SESSION_SECRET set (a throwaway test database: it adds an operation of
 *    its own), the same night through `POST /api/moves/preview` on the real app in this process,
 *    so the figure includes validation, the database reads and the JSON.
 */
import 'reflect-metadata';
import {
  buildMovePlan,
  DEFAULT_PALLET_TARE_KG,
  type PlanFacts,
} from '../server/modules/moves/move-plan';

const YARDS = 12;
const TRUCKS = 40;
const COLONIES_PER_YARD = 650;

function time<T>(label: string, runs: number, run: () => T): T {
  let result = run(); // warm-up (geo-tz reads its data file on first use)
  const samples: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    result = run();
    samples.push(performance.now() - start);
  }
  report(label, samples);
  return result;
}

function report(label: string, samples: number[]) {
  const sorted = [...samples].sort((a, b) => a - b);
  const median = sorted[Math.floor(sorted.length / 2)];
  const p95 = sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * 0.95))];
  console.log(
    `${label.padEnd(58)} median ${median.toFixed(1).padStart(7)} ms   p95 ${p95.toFixed(1).padStart(7)} ms   (n=${samples.length})`,
  );
}

const yardAt = (i: number) => ({
  lat: 27.6 + (i % 4) * 0.25,
  lon: -98.4 + Math.floor(i / 4) * 0.3,
});

const facts: PlanFacts = {
  nightOf: '2027-01-26',
  drivers: 2,
  loadingMinutes: 120,
  averageSpeedKmh: 85,
  palletTareKg: DEFAULT_PALLET_TARE_KG,
  origins: Array.from({ length: YARDS }, (_, i) => ({
    pickupOrder: i,
    yardId: `yard-${i}`,
    yardName: `Yard ${i + 1}`,
    latitude: yardAt(i).lat,
    longitude: yardAt(i).lon,
    lotId: `lot-${i}`,
    lotName: `Lot ${i + 1}`,
    colonies: COLONIES_PER_YARD,
    coloniesPerPallet: 4,
    hiveWeightKg: { mean: 45 + (i % 5) * 2, sd: 4 + (i % 3), samples: 12 },
    weightSource: { kind: 'yard-sample', sampledOn: '2026-12-09' },
    meanFrames: 8,
    strengthSource: { kind: 'lot' },
    freeColonies: COLONIES_PER_YARD,
  })),
  trucks: Array.from({ length: TRUCKS }, (_, i) => ({
    key: `load-${i}`,
    truckId: `truck-${i}`,
    name: `Semi ${i + 1}`,
    driverNames: ['A. Driver', 'B. Driver'],
    payloadKg: 21_000 + (i % 4) * 400,
    palletSpots: 24 + (i % 3),
    tiers: 2,
    tareKg: 14_500,
    legalGrossKg: 36_287.39,
  })),
  destinations: [
    { kind: 'site', id: 'site-1', name: 'Almond block', latitude: 36.62, longitude: -120.31 },
  ],
  contract: {
    id: 'contract-1',
    status: 'agreed',
    coloniesOrdered: 15_000,
    minFrames: 6,
    coloniesOnOtherMoves: 0,
  },
};

console.log(
  `== Move planner: ${TRUCKS} trucks, ${YARDS} yards, ${YARDS * COLONIES_PER_YARD} colonies`,
);
const plan = time('buildMovePlan (load sheet + timelines + warnings)', 50, () =>
  buildMovePlan(facts),
);
console.log(
  `   ${plan.loadSheet.totals.loadedColonies} colonies on ${plan.loadSheet.totals.trucksUsed} trucks, ${plan.loadSheet.totals.leftBehindColonies} left behind, ${plan.warnings.length} warnings`,
);

async function endpoint() {
  if (!process.env.DATABASE_URL || !process.env.SESSION_SECRET) {
    console.log('POST /api/moves/preview: skipped (set DATABASE_URL and SESSION_SECRET)');
    return;
  }
  const { startTestApp, signedInClient } = await import('../tests/support/test-app');
  const { createOperation, createUser, createHiveSetup, createLot, buyColonies, testPassword } =
    await import('../tests/support/factories');
  const t = await startTestApp();
  try {
    const op = await createOperation(t.db, 'Bench operation');
    const planner = await createUser(t.db, op, 'planner');
    const setup = await createHiveSetup(t.db, op);
    const origins = [];
    for (let i = 0; i < YARDS; i++) {
      const lot = await createLot(t.db, op, setup);
      const [yard] = await t.db.query(
        `INSERT INTO yards (operation_id, name, latitude, longitude, capacity) VALUES ($1, $2, $3, $4, 2000) RETURNING id`,
        [op, `Bench yard ${i + 1}`, yardAt(i).lat, yardAt(i).lon],
      );
      await buyColonies(t.db, op, lot, yard.id, COLONIES_PER_YARD);
      await t.db.query(
        `INSERT INTO weight_samples (operation_id, yard_id, lot_id, sampled_on, weights_kg) VALUES ($1, $2, $3, '2026-12-01', $4)`,
        [op, yard.id, lot, [44, 47, 51, 45, 49, 43, 50, 46, 48, 52, 45, 47]],
      );
      origins.push({ yardId: yard.id, lotId: lot, colonies: COLONIES_PER_YARD });
    }
    const loads = [];
    for (let i = 0; i < TRUCKS; i++) {
      const [truck] = await t.db.query(
        `INSERT INTO trucks (operation_id, name, payload_kg, pallet_spots, tiers, tare_kg, legal_gross_kg) VALUES ($1, $2, 21000, 24, 2, 14500, 36287.39) RETURNING id`,
        [op, `Bench semi ${i + 1}`],
      );
      loads.push({ truckId: truck.id, driverNames: ['A. Driver', 'B. Driver'] });
    }
    const [site] = await t.db.query(
      `INSERT INTO sites (operation_id, name, kind, crop, latitude, longitude) VALUES ($1, 'Bench block', 'orchard', 'almond', 36.62, -120.31) RETURNING id`,
      [op],
    );
    const client = await signedInClient(t.app, planner.email, testPassword);
    const body = {
      nightOf: '2027-01-26',
      destinationKind: 'site',
      destinationIds: [site.id],
      drivers: 2,
      loadingMinutes: 120,
      averageSpeedKmh: 85,
      origins,
      loads,
    };
    await client.post('/api/moves/preview', body).expect(200);
    const samples: number[] = [];
    for (let i = 0; i < 20; i++) {
      const start = performance.now();
      await client.post('/api/moves/preview', body).expect(200);
      samples.push(performance.now() - start);
    }
    report('POST /api/moves/preview (app + PostgreSQL)', samples);
  } finally {
    await t.close();
  }
}

await endpoint();

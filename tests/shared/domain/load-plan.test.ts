import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeHiveWeight } from '../../../shared/domain/hive-weight';
import {
  computeLoadPlan,
  planNightLoads,
  type LoadPlanInput,
} from '../../../shared/domain/load-plan';
import { loadWeight } from '../../../shared/domain/load-weight';
import { studentTQuantile } from '../../../shared/domain/statistics';
import { poundsToKg } from '../../../shared/domain/units';

/** The contract's bound, written out independently of the implementation (DESIGN.md). */
function contractUpperKg(
  input: LoadPlanInput,
  colonies: number,
  pallets: number,
  t: number,
): number {
  const { mean, sd, samples } = input.hiveWeightKg;
  const margin =
    sd === 0 || colonies === 0 ? 0 : t * sd * Math.sqrt(colonies + (colonies * colonies) / samples);
  return colonies * mean + margin + pallets * input.palletTareKg;
}

const semi = { payloadKg: poundsToKg(48_000), palletSpots: 26, tiers: 4 };

describe('computeLoadPlan', () => {
  it('when two-deep colonies go on a semi then it carries 400–450 colonies (FreightWaves quoting Project Apis m.)', () => {
    const meanKg = computeHiveWeight({
      boxes: [
        { size: 'deep', honeyFill: 0.3 },
        { size: 'deep', honeyFill: 0.3 },
      ],
    }).weightKg;
    const plan = computeLoadPlan({
      colonies: 2_000,
      coloniesPerPallet: 4,
      palletTareKg: 20,
      hiveWeightKg: { mean: meanKg, sd: 4, samples: 20 },
      trucks: [{ id: 'semi-1', ...semi }],
    });
    expect(plan.trucks[0].colonies).toBeGreaterThanOrEqual(400);
    expect(plan.trucks[0].colonies).toBeLessThanOrEqual(450);
    expect(plan.trucks[0].weightUpperKg).toBeLessThanOrEqual(semi.payloadKg);
  });

  it('when 20 samples with sd 5 then weightUpperKg uses t(0.95, 19) = 1.729 (NIST t table)', () => {
    const input: LoadPlanInput = {
      colonies: 100,
      coloniesPerPallet: 4,
      palletTareKg: 20,
      hiveWeightKg: { mean: 45, sd: 5, samples: 20 },
      trucks: [{ id: 'a', payloadKg: 100_000, palletSpots: 30, tiers: 1 }],
    };
    const truck = computeLoadPlan(input).trucks[0];
    expect(truck).toMatchObject({
      id: 'a',
      pallets: 25,
      colonies: 100,
      weightKg: 100 * 45 + 25 * 20,
    });
    expect(truck.weightUpperKg).toBeCloseTo(contractUpperKg(input, 100, 25, 1.729), 0);
  });

  it('when the weight is exact (sd 0, 1 sample) then the bound equals the expected weight', () => {
    const plan = computeLoadPlan({
      colonies: 10,
      coloniesPerPallet: 4,
      palletTareKg: 10,
      hiveWeightKg: { mean: 40, sd: 0, samples: 1 },
      trucks: [{ id: 'a', payloadKg: 1_000, palletSpots: 10, tiers: 1 }],
    });
    expect(plan.trucks[0]).toMatchObject({
      pallets: 3,
      colonies: 10,
      weightKg: 430,
      weightUpperKg: 430,
    });
  });

  it('when sd > 0 with a single sample then throws (t needs a degree of freedom)', () => {
    expect(() =>
      computeLoadPlan({
        colonies: 10,
        coloniesPerPallet: 4,
        palletTareKg: 10,
        hiveWeightKg: { mean: 40, sd: 3, samples: 1 },
        trucks: [],
      }),
    ).toThrow(/samples must be at least 2/);
  });

  it('when trucks run out then the rest is left behind and totals add up', () => {
    const plan = computeLoadPlan({
      colonies: 1_000,
      coloniesPerPallet: 4,
      palletTareKg: 20,
      hiveWeightKg: { mean: 45, sd: 4, samples: 30 },
      trucks: [
        { id: 'a', payloadKg: 20_000, palletSpots: 26, tiers: 4 },
        { id: 'b', payloadKg: 5_000, palletSpots: 10, tiers: 2 },
      ],
    });
    const loaded = plan.trucks.reduce((s, t) => s + t.colonies, 0);
    expect(plan.unassignedColonies).toBe(1_000 - loaded);
    expect(plan.unassignedColonies).toBeGreaterThan(0);
    expect(plan.trucks[1].pallets).toBe(20); // spots × tiers binds before weight
    expect(plan.totalWeightKg).toBeCloseTo(
      plan.trucks.reduce((s, t) => s + t.weightKg, 0),
      9,
    );
  });

  it('when a partial pallet fits only on a truck limited by weight then it is not left behind', () => {
    // 14 colonies = 3 full pallets of 4 + 1 of 2; the truck carries at most 10 colonies by weight.
    const plan = computeLoadPlan({
      colonies: 14,
      coloniesPerPallet: 4,
      palletTareKg: 0,
      hiveWeightKg: { mean: 10, sd: 0, samples: 1 },
      trucks: [{ id: 'a', payloadKg: 100, palletSpots: 10, tiers: 1 }],
    });
    expect(plan.trucks[0]).toMatchObject({ colonies: 10, pallets: 3 });
    expect(plan.unassignedColonies).toBe(4);
  });

  it('when planned against any input then no truck is over payload by its upper bound, within spots × tiers, loaded + left = given, and no truck has room for a left pallet (fast-check)', () => {
    const truck = fc.record({
      id: fc.uuid(),
      payloadKg: fc.double({ min: 0, max: 30_000, noNaN: true }),
      palletSpots: fc.integer({ min: 0, max: 30 }),
      tiers: fc.integer({ min: 1, max: 3 }),
    });
    const input = fc
      .record({
        colonies: fc.integer({ min: 0, max: 3_000 }),
        coloniesPerPallet: fc.integer({ min: 1, max: 8 }),
        palletTareKg: fc.double({ min: 0, max: 40, noNaN: true }),
        mean: fc.double({ min: 5, max: 90, noNaN: true }),
        sd: fc.oneof(fc.constant(0), fc.double({ min: 0.01, max: 15, noNaN: true })),
        samples: fc.integer({ min: 2, max: 60 }),
        trucks: fc.array(truck, { maxLength: 6 }),
      })
      .map((r): LoadPlanInput => ({
        colonies: r.colonies,
        coloniesPerPallet: r.coloniesPerPallet,
        palletTareKg: r.palletTareKg,
        hiveWeightKg: { mean: r.mean, sd: r.sd, samples: r.samples },
        trucks: r.trucks,
      }));
    fc.assert(
      fc.property(input, (plan) => {
        const result = computeLoadPlan(plan);
        const loaded = result.trucks.reduce((s, t) => s + t.colonies, 0);
        expect(loaded + result.unassignedColonies).toBe(plan.colonies);
        const leftPallet =
          result.unassignedColonies === 0
            ? 0
            : result.unassignedColonies % plan.coloniesPerPallet || plan.coloniesPerPallet;
        result.trucks.forEach((t, i) => {
          const spec = plan.trucks[i];
          expect(t.id).toBe(spec.id);
          expect(t.weightUpperKg).toBeLessThanOrEqual(spec.payloadKg);
          // The bound is the contract's formula (DESIGN.md), not some other number under payload.
          const tValue = studentTQuantile(0.95, plan.hiveWeightKg.samples - 1);
          expect(t.weightUpperKg).toBeCloseTo(
            contractUpperKg(plan, t.colonies, t.pallets, tValue),
            6,
          );
          expect(t.pallets).toBeLessThanOrEqual(spec.palletSpots * spec.tiers);
          expect(t.pallets * plan.coloniesPerPallet).toBeGreaterThanOrEqual(t.colonies);
          if (t.pallets > 0)
            expect((t.pallets - 1) * plan.coloniesPerPallet).toBeLessThan(t.colonies);
          if (leftPallet > 0) {
            const more = loadWeight(
              t.colonies + leftPallet,
              t.pallets + 1,
              plan.palletTareKg,
              plan.hiveWeightKg,
            );
            const hasRoom =
              t.pallets + 1 <= spec.palletSpots * spec.tiers &&
              more.weightUpperKg <= spec.payloadKg;
            expect(hasRoom).toBe(false);
          }
        });
      }),
      { numRuns: 300 },
    );
  });
});

describe('planNightLoads', () => {
  const stats = { mean: 45, sd: 4, samples: 25 };

  it('when three yards fill two trucks then pick-ups follow the yard order and every yard is accounted for', () => {
    const plan = planNightLoads({
      yards: [
        { yardId: 'north', colonies: 150, hiveWeightKg: stats },
        { yardId: 'river', colonies: 300, hiveWeightKg: { mean: 55, sd: 6, samples: 12 } },
        { yardId: 'south', colonies: 90, hiveWeightKg: stats, coloniesPerPallet: 6 },
      ],
      coloniesPerPallet: 4,
      palletTareKg: 20,
      trucks: [
        { id: 't1', payloadKg: 20_000, palletSpots: 26, tiers: 4 },
        { id: 't2', payloadKg: 20_000, palletSpots: 26, tiers: 4 },
      ],
    });
    expect(plan.trucks[0].stops.map((s) => s.yardId)).toEqual(['north', 'river']);
    expect(plan.trucks[1].stops[0].yardId).toBe('river');
    for (const y of plan.yards) expect(y.loadedColonies + y.unassignedColonies).toBeGreaterThan(0);
    expect(plan.yards.reduce((s, y) => s + y.loadedColonies, 0) + plan.unassignedColonies).toBe(
      540,
    );
    for (const t of plan.trucks) {
      expect(t.weightUpperKg).toBeLessThanOrEqual(20_000);
      expect(t.colonies).toBe(t.stops.reduce((s, stop) => s + stop.colonies, 0));
    }
  });

  it('when one yard is planned then it matches computeLoadPlan', () => {
    const trucks = [{ id: 'a', payloadKg: 18_000, palletSpots: 26, tiers: 4 }];
    const night = planNightLoads({
      yards: [{ yardId: 'y', colonies: 500, hiveWeightKg: stats }],
      coloniesPerPallet: 4,
      palletTareKg: 20,
      trucks,
    });
    const single = computeLoadPlan({
      colonies: 500,
      coloniesPerPallet: 4,
      palletTareKg: 20,
      hiveWeightKg: stats,
      trucks,
    });
    expect(night.trucks[0].colonies).toBe(single.trucks[0].colonies);
    expect(night.trucks[0].weightUpperKg).toBeCloseTo(single.trucks[0].weightUpperKg, 9);
  });

  it('when two yards share a truck then its bound is not below the sum of each yard alone (conservative)', () => {
    const plan = planNightLoads({
      yards: [
        { yardId: 'a', colonies: 40, hiveWeightKg: stats },
        { yardId: 'b', colonies: 40, hiveWeightKg: stats },
      ],
      coloniesPerPallet: 4,
      palletTareKg: 0,
      trucks: [{ id: 't', payloadKg: 50_000, palletSpots: 30, tiers: 1 }],
    });
    const alone = loadWeight(40, 10, 0, stats);
    expect(plan.trucks[0].weightUpperKg).toBeCloseTo(2 * alone.weightUpperKg, 9);
    expect(plan.trucks[0].weightUpperKg).toBeGreaterThan(
      loadWeight(80, 20, 0, stats).weightUpperKg,
    );
  });
});

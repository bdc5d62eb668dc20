import { describe, expect, it } from 'vitest';
import {
  moveCautions,
  moveWarnings,
  seasonalRisk,
  type MoveWarningFacts,
  type TruckFacts,
} from '../../../shared/domain/move-warnings';

const truck = (overrides: Partial<TruckFacts> = {}): TruckFacts => ({
  key: 'load-0',
  name: 'Semi 1',
  colonies: 400,
  weightUpperKg: 20_000,
  payloadKg: 21_000,
  grossKg: 35_000,
  legalGrossKg: 36_287.39, // 80,000 lb, 23 CFR 658.17 [source]
  arrivesBeforeDawn: true,
  arrival: '2027-01-27T05:40:00-08:00',
  civilDawn: '2027-01-27T06:41:00-08:00',
  ...overrides,
});

const facts = (overrides: Partial<MoveWarningFacts> = {}): MoveWarningFacts => ({
  trucks: [truck()],
  origins: [
    {
      yardId: 'yard-a',
      yardName: 'Yard A',
      lotId: 'lot-a',
      lotName: 'Two deeps',
      colonies: 400,
      freeColonies: 500,
      meanFrames: 8,
      weightAssumed: false,
    },
  ],
  unassignedColonies: 0,
  contract: null,
  ...overrides,
});

const codes = (f: MoveWarningFacts) => moveWarnings(f).map((w) => w.code);

describe('moveWarnings', () => {
  it('when everything fits and arrives before dawn then there is nothing to warn about', () => {
    expect(moveWarnings(facts())).toEqual([]);
  });

  it('when a truck arrives after civil dawn then it warns about that truck', () => {
    const [warning] = moveWarnings(
      facts({
        trucks: [truck({ arrivesBeforeDawn: false, arrival: '2027-01-27T09:10:00-08:00' })],
      }),
    );
    expect(warning).toMatchObject({
      code: 'arrives-after-dawn',
      severity: 'danger',
      truckKey: 'load-0',
    });
    // On the destination's clock; 2027-01-27 is a Wednesday.
    expect(warning.message).toContain(
      'arrives at Wed 9:10 AM (UTC−8), after civil dawn (Wed 6:41 AM (UTC−8))',
    );
  });

  it('when colonies are left behind or a bound is over payload or legal gross then it warns (danger)', () => {
    expect(codes(facts({ unassignedColonies: 12 }))).toEqual(['over-payload']);
    expect(codes(facts({ trucks: [truck({ weightUpperKg: 21_500 })] }))).toEqual(['over-payload']);
    expect(codes(facts({ trucks: [truck({ grossKg: 37_000 })] }))).toEqual(['over-legal-gross']);
    // A truck carrying nothing is never over anything.
    expect(codes(facts({ trucks: [truck({ colonies: 0, grossKg: 40_000 })] }))).toEqual([]);
    expect(codes(facts({ trucks: [] }))).toEqual(['no-trucks']);
  });

  it('when the contract is offered, short and asks for more frames than the lot has then it warns of each', () => {
    const f = facts({
      contract: {
        status: 'offered',
        coloniesOrdered: 1000,
        minFrames: 8.5,
        coloniesOnOtherMoves: 400,
      },
    });
    expect(codes(f).sort()).toEqual(['colonies-too-weak', 'contract-not-agreed', 'short-of-order']);
    expect(moveWarnings(f).find((w) => w.code === 'short-of-order')?.message).toContain(
      '200 short',
    );
  });

  it('when the contract is agreed and this move with the others covers the order then it is quiet', () => {
    const f = facts({
      contract: { status: 'agreed', coloniesOrdered: 800, minFrames: 6, coloniesOnOtherMoves: 400 },
    });
    expect(codes(f)).toEqual([]);
  });

  it('when the strength is unknown then it says so (info) instead of passing or failing the lot', () => {
    const f = facts({
      origins: [{ ...facts().origins[0], meanFrames: null }],
      contract: { status: 'agreed', coloniesOrdered: 400, minFrames: 6, coloniesOnOtherMoves: 0 },
    });
    expect(moveWarnings(f)).toEqual([
      expect.objectContaining({ code: 'strength-unknown', severity: 'info' }),
    ]);
  });

  it('when two origins take the same lot at one yard then their sum is checked against what is free', () => {
    const origin = { ...facts().origins[0], colonies: 300, freeColonies: 500 };
    const f = facts({ origins: [origin, origin] });
    const warnings = moveWarnings(f).filter((w) => w.code === 'colonies-not-available');
    expect(warnings).toHaveLength(1);
    expect(warnings[0].message).toContain('600 wanted, only 500 free');
  });

  it('when weights are assumed then an info note follows the dangers', () => {
    const f = facts({
      origins: [{ ...facts().origins[0], weightAssumed: true }],
      unassignedColonies: 4,
    });
    expect(codes(f)).toEqual(['over-payload', 'weights-assumed']);
  });
});

describe('seasonalRisk and moveCautions', () => {
  // Rule of thumb, common practice [practice]: heat May–Sep, cold Nov–Feb, north; shifted south.
  it('when the night is in July up north then heat; in January cold; in April neither', () => {
    expect(seasonalRisk('2027-07-10', 46.9)).toBe('heat');
    expect(seasonalRisk('2027-01-26', 36.6)).toBe('cold');
    expect(seasonalRisk('2027-04-15', 46.9)).toBeNull();
    expect(seasonalRisk('2027-10-15', 28)).toBeNull();
  });

  it('when the place is south of the equator then the seasons swap', () => {
    expect(seasonalRisk('2027-01-15', -34.9)).toBe('heat');
    expect(seasonalRisk('2027-07-15', -34.9)).toBe('cold');
  });

  it('when a move is planned then the standing cautions are always there, plus the season’s', () => {
    const summer = moveCautions({ nightOf: '2027-06-20', latitudes: [28, 47] }).map((c) => c.code);
    expect(summer).toEqual([
      'night-driving',
      'netting-ventilation',
      'lifting',
      'heat-stopped-load',
    ]);
    const spring = moveCautions({ nightOf: '2027-04-10', latitudes: [36.6] }).map((c) => c.code);
    expect(spring).toEqual(['night-driving', 'netting-ventilation', 'lifting']);
    for (const c of moveCautions({ nightOf: '2027-01-26', latitudes: [28] }))
      expect(c.message.length).toBeGreaterThan(40);
  });
});

describe('moveWarnings on long hauls', () => {
  it('when a haul passes the first dawn but rolls in during a later night then it is a note, not a danger', () => {
    const [warning] = moveWarnings(
      facts({
        trucks: [
          truck({
            arrivesBeforeDawn: false,
            arrivesInDarkness: true,
            arrival: '2027-01-28T03:21:00-08:00',
          }),
        ],
      }),
    );
    expect(warning).toMatchObject({ code: 'multi-night-haul', severity: 'info' });
  });

  it('when it arrives after the first dawn in daylight then it is the after-dawn danger', () => {
    const f = facts({
      trucks: [truck({ arrivesBeforeDawn: false, arrivesInDarkness: false })],
    });
    expect(codes(f)).toEqual(['arrives-after-dawn']);
  });
});

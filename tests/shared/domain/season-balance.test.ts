import { describe, expect, it } from 'vitest';
import { isoWeekLabel, isoWeekStart } from '../../../shared/domain/iso-week';
import { computeSeasonBalance, weeksInPeriod } from '../../../shared/domain/season-balance';

describe('ISO weeks (ISO 8601)', () => {
  it.each([
    ['2026-01-01', '2026-W01', '2025-12-29'], // a Thursday: week 1 holds the year's first Thursday
    ['2027-01-01', '2026-W53', '2026-12-28'], // 2026 starts on a Thursday, so it has 53 weeks
    ['2021-01-03', '2020-W53', '2020-12-28'],
    ['2026-02-09', '2026-W07', '2026-02-09'], // a Monday starts its own week
  ])('when %s then the week is %s starting Monday %s', (date, label, monday) => {
    expect(isoWeekLabel(date)).toBe(label);
    expect(isoWeekStart(date)).toBe(monday);
  });
});

describe('computeSeasonBalance', () => {
  const input = {
    contracts: [
      {
        id: 'almonds',
        colonies: 1_000,
        minFramesOfBees: 6,
        deliveryDate: '2026-02-05',
        removalDate: '2026-03-10',
      },
      {
        id: 'apples',
        colonies: 300,
        minFramesOfBees: 4,
        deliveryDate: '2026-02-10',
        removalDate: '2026-02-15',
      },
    ],
    lots: [
      { id: 'strong', colonies: 800, meanFramesOfBees: 8, availableFrom: '2026-01-01' },
      {
        id: 'weak',
        colonies: 600,
        meanFramesOfBees: 5,
        availableFrom: '2026-01-01',
        availableTo: '2026-02-18',
      },
    ],
    from: '2026-02-02',
    to: '2026-02-22',
  };

  it('when counted week by week then needed and available follow the dates (Monday weeks)', () => {
    const weeks = computeSeasonBalance(input);
    expect(weeks.map((w) => w.week)).toEqual(['2026-W06', '2026-W07', '2026-W08']);
    expect(weeks.map((w) => w.coloniesNeeded)).toEqual([1_000, 1_300, 1_000]);
    // The weak lot leaves mid-week 8 (Feb 18), so it does not count that week.
    expect(weeks.map((w) => w.coloniesAvailable)).toEqual([1_400, 1_400, 800]);
    expect(weeks[2].shortfall).toBe(200);
  });

  it('when enough colonies but too few strong ones then the strength check shows the shortfall', () => {
    const [w6] = computeSeasonBalance(input);
    expect(w6.shortfall).toBe(0);
    expect(w6.byStrength).toEqual([
      { minFramesOfBees: 6, needed: 1_000, available: 800, shortfall: 200 },
    ]);
    expect(w6.covered).toBe(false);
  });

  it('when thresholds nest then each counts contracts at or above it (Hall’s condition)', () => {
    const w7 = computeSeasonBalance(input)[1];
    expect(w7.byStrength).toEqual([
      { minFramesOfBees: 6, needed: 1_000, available: 800, shortfall: 200 },
      { minFramesOfBees: 4, needed: 1_300, available: 1_400, shortfall: 0 },
    ]);
  });

  it('when the period spans a year end then it counts the ISO weeks', () => {
    expect(weeksInPeriod('2026-12-20', '2027-01-10')).toBe(4);
  });

  it('when a contract ends before it starts then throws naming it', () => {
    expect(() =>
      computeSeasonBalance({
        ...input,
        contracts: [
          {
            id: 'x',
            colonies: 1,
            minFramesOfBees: 0,
            deliveryDate: '2026-03-01',
            removalDate: '2026-02-01',
          },
        ],
      }),
    ).toThrow(/contracts\[0\]/);
  });
});

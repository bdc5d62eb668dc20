import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { ScaleReadings } from '@/features/samples/components/scale-readings';
import { StrengthChecks } from '@/features/samples/components/strength-checks';
import { parseReadings } from '@/features/samples/readings';
import type { StrengthSample, WeightSample } from '@/features/samples/types';

const lotId = '33333333-3333-4333-8333-333333333333';
const lotNames = { [lotId]: 'Two-deep winter lot' };

const weighed: WeightSample = {
  id: 'w1',
  yardId: 'y1',
  lotId,
  moveId: null,
  sampledOn: '2026-02-03',
  weightsKg: [45.359237, 49.8951607],
  // 100 lb and 110 lb: mean 105 lb, sd 7.0711 lb.
  summary: { mean: 47.62719885, sd: 3.207366, samples: 2 },
  notes: '',
  createdAt: '2026-02-03T18:00:00Z',
};

const inspected: StrengthSample = {
  id: 's1',
  placeKind: 'yard',
  placeId: 'y1',
  lotId: null,
  sampledOn: '2026-02-04',
  frames: [8, 6, 5, 9],
  minimumFrames: 6,
  summary: {
    samples: 4,
    meanFrames: 7,
    sdFrames: 1.826,
    meanInterval: { lower: 4.094, upper: 9.906 },
    atOrAboveMinimum: 3,
    shareAtOrAboveMinimum: 0.75,
    shareInterval: { lower: 0.301, upper: 0.954 },
    confidence: 0.95,
  },
  notes: '',
  createdAt: '2026-02-04T18:00:00Z',
};

describe('parseReadings', () => {
  it('when entries are split by spaces, commas, semicolons and lines then each is one reading', () => {
    expect(parseReadings(' 52.5, 61;48\n\n.5 ')).toEqual({
      entries: ['52.5', '61', '48', '.5'],
      values: [52.5, 61, 48, 0.5],
      invalid: [],
    });
  });

  it('when an entry is hex, exponent or words then it is invalid, not silently a number', () => {
    expect(parseReadings('0x1F 1e3 Infinity 7').invalid).toEqual(['0x1F', '1e3', 'Infinity']);
  });
});

describe('ScaleReadings', () => {
  it('when the user works in lb then mean ± sd are shown in lb', () => {
    render(<ScaleReadings samples={[weighed]} lotNames={lotNames} units="imperial" />);
    expect(screen.getByText('105.0 ± 7.1 lb')).toBeTruthy();
    expect(screen.getByText('Two-deep winter lot')).toBeTruthy();
    expect(screen.getByText(/Load plans use the mean and the spread/)).toBeTruthy();
  });

  it('when nothing has been weighed then it says how to record weights', () => {
    render(<ScaleReadings samples={[]} lotNames={lotNames} units="metric" />);
    expect(screen.getByText(/use Record weights/)).toBeTruthy();
  });
});

describe('StrengthChecks', () => {
  it('when a check has a summary then mean frames and the share at 6 frames show their intervals', () => {
    render(<StrengthChecks samples={[inspected]} lotNames={lotNames} />);
    expect(screen.getByText('At or above 6 frames')).toBeTruthy();
    expect(screen.getByText('7.0')).toBeTruthy();
    expect(screen.getByText('(4.1–9.9)')).toBeTruthy();
    expect(screen.getByText('75 %')).toBeTruthy();
    expect(screen.getByText('(30 %–95 %)')).toBeTruthy();
  });
});

import type { AtlasContractStatus, AtlasMoveStatus } from '../api/types';

/** Colours of the map's own records, one set for day and one for night (red on black). */
export interface OverlayPalette {
  yardFill: string;
  yardStroke: string;
  drop: string;
  forage: string;
  spray: string;
  selected: string;
  contract: Record<AtlasContractStatus | 'none', string>;
  move: string;
}

export const dayOverlay: OverlayPalette = {
  yardFill: '#d9891c',
  yardStroke: '#4a2c06',
  drop: '#3f2a55',
  forage: '#7a6a2e',
  spray: '#b3261e',
  selected: '#0b5cad',
  contract: {
    none: '#7b8794',
    draft: '#9aa5b1',
    offered: '#c08a00',
    agreed: '#2e7d4f',
    'in-bloom': '#b04a8f',
    released: '#3d6fa3',
    settled: '#56606b',
    'turned-down': '#8c3b32',
    withdrawn: '#8c3b32',
  },
  move: '#23374f',
};

export const nightOverlay: OverlayPalette = {
  yardFill: '#ff4a36',
  yardStroke: '#2b0000',
  drop: '#ff8a70',
  forage: '#7d1a12',
  spray: '#ffb199',
  selected: '#ffd0c4',
  contract: {
    none: '#6e2a22',
    draft: '#6e2a22',
    offered: '#c2410c',
    agreed: '#ff3b2f',
    'in-bloom': '#ff6f5e',
    released: '#a3281d',
    settled: '#5c1d16',
    'turned-down': '#4a1510',
    withdrawn: '#4a1510',
  },
  move: '#ff5a47',
};

/** Words for the legend. */
export const contractStateLabels: Record<AtlasContractStatus | 'none', string> = {
  none: 'No contract',
  draft: 'Draft',
  offered: 'Offered',
  agreed: 'Agreed',
  'in-bloom': 'In bloom',
  released: 'Released',
  settled: 'Settled',
  'turned-down': 'Turned down',
  withdrawn: 'Withdrawn',
};

/** The three ways a move line is drawn. */
export type MoveStyle = 'planned' | 'rolling' | 'placed';

export function moveStyleOf(status: AtlasMoveStatus): MoveStyle {
  if (status === 'loading' || status === 'rolling') return 'rolling';
  if (status === 'placed' || status === 'closed') return 'placed';
  return 'planned';
}

/** Line weight, dash and opacity of each move style. */
export const moveLine: Record<MoveStyle, { weight: number; dashArray?: string; opacity: number }> =
  {
    planned: { weight: 2.5, dashArray: '8 7', opacity: 0.9 },
    rolling: { weight: 4.5, opacity: 1 },
    placed: { weight: 2, dashArray: '2 6', opacity: 0.6 },
  };

export const moveStyleLabels: Record<MoveStyle, string> = {
  planned: 'Planned',
  rolling: 'Loading or rolling',
  placed: 'Placed',
};

/** Yard marker radius in pixels: grows with the square root of colonies (area ∝ count). */
export function yardRadius(colonies: number): number {
  return Math.min(24, 4 + Math.sqrt(Math.max(0, colonies)) * 0.5);
}

import type { MoveStatus } from '@shared/schemas/moves';

/** GET /api/season (docs/moves.md): the board's weeks, contracts, moves and balance. */
export interface SeasonBoard {
  from: string;
  to: string;
  weeks: Array<{ week: string; weekStart: string; weekEnd: string }>;
  contracts: Array<{
    id: string;
    growerId: string;
    growerName: string;
    siteIds: string[];
    crop: string;
    status: string;
    countsTowardsDemand: boolean;
    coloniesOrdered: number;
    minFrames: number;
    averageFrames: number | null;
    deliveryStartOn: string;
    deliveryEndOn: string;
    removalOn: string | null;
    removalAssumed: boolean;
    deliveryWeeks: string[];
    weeks: string[];
  }>;
  moves: Array<{
    id: string;
    name: string;
    nightOf: string;
    week: string;
    status: MoveStatus;
    contractId: string | null;
    colonies: number;
    trucks: number;
  }>;
  supply: Array<{ lotId: string; lotName: string; colonies: number; meanFrames: number | null }>;
  balance: Array<{
    week: string;
    weekStart: string;
    coloniesNeeded: number;
    coloniesAvailable: number;
    shortfall: number;
    byStrength: Array<{
      minFramesOfBees: number;
      needed: number;
      available: number;
      shortfall: number;
    }>;
    covered: boolean;
    contractIds: string[];
  }>;
  notes: string[];
}

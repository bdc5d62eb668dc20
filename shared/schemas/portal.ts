/** What GET /api/portal/placements answers for each of a grower's blocks (types only). */
export interface BlockPlacement {
  siteId: string;
  siteName: string;
  /** Colonies on the block today, from the beekeeper's ledger. */
  coloniesToday: number;
  /** Strength checks at the block, newest first. */
  strengthChecks: Array<{
    sampledOn: string;
    coloniesInspected: number;
    /** Mean frames of bees in the sample. */
    meanFrames: number | null;
    /** The minimum of the contract covering the block, when there is one. */
    minimumFrames: number | null;
    /** Inspected colonies at or above that minimum. */
    atOrAboveMinimum: number | null;
  }>;
}

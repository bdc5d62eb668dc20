/**
 * What GET /api/atlas answers: the operation's places and moves on one date, as GeoJSON
 * feature collections the map draws directly. Types only (no runtime code), so the client can
 * import them without pulling in the server.
 */
import type { FeatureCollection, LineString, MultiLineString, Point, Polygon } from 'geojson';

/** A contract's status, as the contracts API spells it. */
export type AtlasContractStatus =
  | 'draft'
  | 'offered'
  | 'agreed'
  | 'turned-down'
  | 'in-bloom'
  | 'released'
  | 'settled'
  | 'withdrawn';

export type AtlasMoveStatus =
  'draft' | 'planned' | 'loading' | 'rolling' | 'placed' | 'closed' | 'cancelled';

/** The next move touching a place (from or to it), on or after the date. */
export interface AtlasNextMove {
  id: string;
  name: string;
  nightOf: string;
  status: AtlasMoveStatus;
  direction: 'out' | 'in';
}

/** Colonies of one lot at a place on the date. */
export interface AtlasLotCount {
  lotId: string;
  lotName: string;
  hiveSetupName: string;
  colonies: number;
}

export interface AtlasYardProperties {
  id: string;
  name: string;
  capacity: number;
  /** Colonies there on the date, from the ledger. */
  colonies: number;
  lots: AtlasLotCount[];
  lastVisitOn: string | null;
  nextMove: AtlasNextMove | null;
}

/** The contract that governs a site on the date (active, else the next, else the latest). */
export interface AtlasContract {
  id: string;
  status: AtlasContractStatus;
  season: number;
  coloniesOrdered: number;
  minFrames: number;
  deliveryStartOn: string;
  deliveryEndOn: string;
  removalOn: string | null;
  /** Absent for crew: they see no prices. */
  feePerColonyCents?: number;
}

export interface AtlasSiteProperties {
  id: string;
  name: string;
  kind: 'orchard' | 'seed-field' | 'honey';
  crop: string;
  growerId: string | null;
  growerName: string | null;
  /** Point inside the block (the boundary's when drawn), for labels and forage rings. */
  latitude: number;
  longitude: number;
  areaHa: number | null;
  hasBoundary: boolean;
  bloomStartOn: string | null;
  bloomEndOn: string | null;
  colonies: number;
  lots: AtlasLotCount[];
  dropCount: number;
  contract: AtlasContract | null;
  /** Colour key of the map: the contract's status, or `none`. */
  contractState: AtlasContractStatus | 'none';
  nextMove: AtlasNextMove | null;
  version: number;
}

export interface AtlasDropProperties {
  siteId: string;
  siteName: string;
  drop: number;
  pallets: number;
  colonies: number;
}

export interface AtlasMoveProperties {
  id: string;
  name: string;
  nightOf: string;
  status: AtlasMoveStatus;
  colonies: number;
  originYardIds: string[];
  destinationKind: 'yard' | 'site';
  destinationIds: string[];
  /** Night of the move relative to the date: before it, that night, or after it. */
  timing: 'past' | 'tonight' | 'upcoming';
}

export interface AtlasSprayNoticeProperties {
  id: string;
  siteId: string;
  siteName: string;
  product: string;
  startsAt: string;
  endsAt: string;
  status: string;
  /** Yards and sites whose point lies within `reachKm` of the sprayed site's point. */
  yardsInReach: Array<{ id: string; name: string; distanceKm: number }>;
  sitesInReach: Array<{ id: string; name: string; distanceKm: number }>;
  reachKm: number;
}

export interface AtlasGrower {
  id: string;
  name: string;
  siteIds: string[];
}

export interface AtlasSummary {
  /** The date the positions are for, YYYY-MM-DD. */
  on: string;
  /** Moves with a night in [on − movesBeforeDays, on + movesAfterDays] are included. */
  movesWindow: { from: string; to: string };
  yards: FeatureCollection<Point, AtlasYardProperties>;
  sites: FeatureCollection<Polygon | Point, AtlasSiteProperties>;
  drops: FeatureCollection<Point, AtlasDropProperties>;
  moves: FeatureCollection<LineString | MultiLineString, AtlasMoveProperties>;
  sprayNotices: FeatureCollection<Point, AtlasSprayNoticeProperties>;
  growers: AtlasGrower[];
  /** Colonies on the date across all yards and sites. */
  totalColonies: number;
}

/** What POST /api/sites/:id/boundary and PATCH /api/sites/:id/drops answer. */
export interface SiteBoundaryResult {
  id: string;
  version: number;
  boundary: Polygon | null;
  latitude: number;
  longitude: number;
  areaHa: number | null;
  drops: FeatureCollection<Point> | null;
  plan: {
    areaHa: number;
    areaAcres: number;
    hivesPerAcre: number | null;
    colonies: number | null;
    pallets: number | null;
    dropCount: number;
  };
}

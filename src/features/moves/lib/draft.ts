import type { MoveCreateRequest, MovePreviewRequest } from '@shared/schemas/moves';
import type { Move } from '../types';

/** What the planner edits; turned into a create, update or preview body. */
export interface MoveDraft {
  name: string;
  nightOf: string;
  destinationKind: 'site' | 'yard';
  destinationIds: string[];
  contractId: string | null;
  /** In pick-up order. */
  origins: Array<{ yardId: string; lotId: string; colonies: number }>;
  /** In fill order. */
  loads: Array<{ truckId: string; driverNames: string[] }>;
  drivers: 1 | 2;
  loadingMinutes: number;
  averageSpeedKmh: number;
  notes: string;
}

/** Common practice for a semi: two hours at the yards, 85 km/h on the road including stops. */
export const emptyDraft = (nightOf: string, destinationSiteId?: string | null): MoveDraft => ({
  name: '',
  nightOf,
  destinationKind: 'site',
  destinationIds: destinationSiteId ? [destinationSiteId] : [],
  contractId: null,
  origins: [],
  loads: [],
  drivers: 1,
  loadingMinutes: 120,
  averageSpeedKmh: 85,
  notes: '',
});

/** A saved move as a draft to edit. */
export function draftFromMove(move: Move): MoveDraft {
  return {
    name: move.name,
    nightOf: move.nightOf,
    destinationKind: move.destinationKind,
    destinationIds: move.destinationIds,
    contractId: move.contractId,
    origins: [...move.origins]
      .sort((a, b) => a.pickupOrder - b.pickupOrder)
      .map(({ yardId, lotId, colonies }) => ({ yardId, lotId, colonies })),
    loads: [...move.loads]
      .sort((a, b) => a.position - b.position)
      .map((l) => ({ truckId: l.truckId, driverNames: l.driverNames })),
    drivers: move.drivers,
    loadingMinutes: move.loadingMinutes,
    averageSpeedKmh: move.averageSpeedKmh,
    notes: move.notes,
  };
}

const cleanLoads = (draft: MoveDraft) =>
  draft.loads.map((l) => ({
    truckId: l.truckId,
    driverNames: l.driverNames
      .map((n) => n.trim())
      .filter(Boolean)
      .slice(0, draft.drivers),
  }));

/** The create body (also the update's changes). */
export function toMoveRequest(draft: MoveDraft): MoveCreateRequest {
  return {
    name: draft.name.trim(),
    nightOf: draft.nightOf,
    destinationKind: draft.destinationKind,
    destinationIds: draft.destinationIds,
    contractId: draft.contractId,
    origins: draft.origins.filter((o) => o.colonies > 0),
    loads: cleanLoads(draft),
    drivers: draft.drivers,
    loadingMinutes: draft.loadingMinutes,
    averageSpeedKmh: draft.averageSpeedKmh,
    notes: draft.notes,
  };
}

/** The preview body, or null while the draft is not enough to plan (no night, destination or colonies). */
export function toPreviewRequest(draft: MoveDraft, moveId?: string): MovePreviewRequest | null {
  const origins = draft.origins.filter((o) => o.colonies > 0);
  if (!/^\d{4}-\d{2}-\d{2}$/.test(draft.nightOf)) return null;
  if (draft.destinationIds.length === 0 || origins.length === 0) return null;
  if (!(draft.averageSpeedKmh > 0) || !(draft.loadingMinutes >= 0)) return null;
  const { name, ...rest } = toMoveRequest(draft);
  return { ...rest, ...(name ? { name } : {}), origins, ...(moveId ? { moveId } : {}) };
}

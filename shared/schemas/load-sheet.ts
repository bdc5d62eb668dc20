/**
 * The shape of a move's load sheet (GET /api/moves/:id/load-sheet): built by
 * server/modules/moves/load-sheet.ts, read by the print view, the move page and Tonight. Types only.
 */
import type { MoveCaution, MoveWarning } from '../domain/move-warnings';
import type { PlanTimeline, PlanTotals, PlannedStop, PlannedTruck } from './move-plan';
import type { LoadRecord, MoveStatus } from './moves';

/** A pick-up stop with what the crew need there; the yard's place is null if it was deleted. */
export interface LoadSheetStop extends PlannedStop {
  latitude: number | null;
  longitude: number | null;
  accessNotes: string;
  timeZone: string | null;
  civilDusk: string | null;
}

/** One truck's page. `loadId` and `recorded` are null for a plan computed without saved loads. */
export interface LoadSheetPage extends Omit<PlannedTruck, 'stops'> {
  page: number;
  loadId: string | null;
  stops: LoadSheetStop[];
  recorded: LoadRecord | null;
}

export interface LoadSheetDestination {
  kind: 'yard' | 'site';
  id: string;
  name: string;
  latitude: number | null;
  longitude: number | null;
  accessNotes: string;
  crop: string | null;
  dropMap: { siteId: string; drops: number } | null;
  grower: {
    id: string;
    name: string;
    contacts: Array<{ name: string; phone: string | null; title: string | null }>;
  } | null;
}

export interface LoadSheetContract {
  id: string;
  crop: string;
  status: string;
  coloniesOrdered: number;
  minFrames: number;
  averageFrames: number | null;
  deliveryStartOn: string;
  deliveryEndOn: string;
}

/** GET /api/moves/:id/load-sheet: printable pages, one per truck. */
export interface LoadSheet {
  move: {
    id: string;
    name: string;
    nightOf: string;
    status: MoveStatus;
    drivers: 1 | 2;
    loadingMinutes: number;
    averageSpeedKmh: number;
    notes: string;
    version: number;
  };
  planSource: 'saved' | 'computed-now';
  computedAt: string;
  contract: LoadSheetContract | null;
  destinations: LoadSheetDestination[];
  timeline: PlanTimeline;
  totals: PlanTotals;
  palletTareKg: number;
  pages: LoadSheetPage[];
  warnings: MoveWarning[];
  cautions: MoveCaution[];
  assumptions: string[];
}

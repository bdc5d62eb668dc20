import type { LoadSheetPage } from '@shared/schemas/load-sheet';
import type { LoadRecord, MoveStatus, SyncKind, SyncOutcome } from '@shared/schemas/moves';
export type { LoadRecord } from '@shared/schemas/moves';

/** One truck of tonight's move: its load-sheet page, with the saved load the crew records on. */
export type TonightLoad = Pick<
  LoadSheetPage,
  'key' | 'truckName' | 'driverNames' | 'pallets' | 'colonies' | 'departure' | 'arrival' | 'stops'
> & { loadId: string; recorded: LoadRecord };

/** A move of tonight (or tomorrow) with what the crew needs in the cab. */
export interface TonightMove {
  id: string;
  name: string;
  nightOf: string;
  status: MoveStatus;
  version: number;
  destinations: Array<{ id: string; name: string; accessNotes: string }>;
  loads: TonightLoad[];
  cautions: Array<{ code: string; message: string }>;
}

/** What Tonight shows, kept on the device for when there is no signal. */
export interface TonightSnapshot {
  fetchedAt: string;
  /** The nights shown (today and tomorrow, or the next night with moves). */
  nights: string[];
  /** True when nothing is on today or tomorrow and the next night with moves is shown. */
  upcoming: boolean;
  moves: TonightMove[];
}

/** One change as POST /api/moves/sync takes it. */
export interface SyncChange {
  idempotencyKey: string;
  kind: SyncKind;
  moveId: string;
  loadId?: string;
  version?: number;
  payload: Record<string, unknown>;
}

/** What became of one change. */
export interface SyncResult {
  index: number;
  idempotencyKey: string;
  kind: SyncKind;
  moveId: string;
  loadId: string | null;
  outcome: SyncOutcome;
  status: number;
  record?: Record<string, unknown> & { version?: number };
  current?: Record<string, unknown> & { version?: number };
  error?: { code: string; message: string; details?: unknown };
}

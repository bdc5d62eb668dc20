import type { WeightSampleSummary } from '@shared/domain/hive-weight';
import type { StrengthSummary } from '@shared/domain/strength';
import type { PlaceKind } from '@shared/schemas/ledger';

/** Hive weights read off a scale, as the API presents them (kg). */
export interface WeightSample {
  id: string;
  yardId: string | null;
  lotId: string | null;
  moveId: string | null;
  sampledOn: string;
  weightsKg: number[];
  /** Null for a single reading: a spread needs two. */
  summary: WeightSampleSummary | null;
  notes: string;
  createdAt: string;
}

/** Frames-of-bees counts from one inspection, as the API presents them. */
export interface StrengthSample {
  id: string;
  placeKind: PlaceKind;
  placeId: string;
  lotId: string | null;
  sampledOn: string;
  frames: number[];
  minimumFrames: number;
  /** Null when fewer than 2 colonies were inspected (no spread to estimate). */
  summary: StrengthSummary | null;
  notes: string;
  createdAt: string;
}

export interface WeightSampleFilters {
  yardId?: string;
  lotId?: string;
  moveId?: string;
  limit?: number;
}

export interface StrengthSampleFilters {
  placeKind?: PlaceKind;
  placeId?: string;
  lotId?: string;
  minimumFrames?: number;
  limit?: number;
}

/** A colony lot the user may say was sampled, with how many of its colonies are here today. */
export interface LotChoice {
  id: string;
  name: string;
  coloniesHere: number;
}

import type { SprayAction, sprayNoticeStatuses } from '@shared/schemas/spray-notices';

export type SprayNoticeStatus = (typeof sprayNoticeStatuses)[number];

/** A spray notice as the API presents it; the action note and who acknowledged are staff-only. */
export interface SprayNotice {
  id: string;
  growerId: string;
  siteId: string;
  startsAt: string;
  endsAt: string;
  product: string;
  notes: string;
  status: SprayNoticeStatus;
  action: SprayAction | null;
  actionNote?: string;
  acknowledgedBy?: string | null;
  acknowledgedAt: string | null;
  version: number;
  archivedAt: string | null;
  createdAt: string;
  caution: string;
}

export interface SprayNoticeList {
  items: SprayNotice[];
  total: number;
  caution: string;
}

export interface SprayNoticeFilters {
  status?: SprayNoticeStatus;
  siteId?: string;
}

export const sprayActionLabels: Record<SprayAction, string> = {
  move: 'Colonies moved out',
  cover: 'Colonies covered',
  'no-action': 'No action needed',
};

export const sprayStatusLabels: Record<SprayNoticeStatus, string> = {
  filed: 'Waiting for the beekeeper',
  acknowledged: 'Acknowledged',
};

import type { SprayNoticeFilters } from '../types';

/** Query keys of spray notices: ['spray-notices','list',filters]. */
export const sprayNoticeKeys = {
  all: ['spray-notices'] as const,
  lists: () => [...sprayNoticeKeys.all, 'list'] as const,
  list: (filters: SprayNoticeFilters) => [...sprayNoticeKeys.lists(), filters] as const,
};

import type { MovePreviewRequest } from '@shared/schemas/moves';

export interface MoveListFilters {
  from?: string;
  to?: string;
  status?: string;
}

/** Query keys of moves: lists by filters, details, load sheets, previews and availability. */
export const moveKeys = {
  all: ['moves'] as const,
  lists: () => [...moveKeys.all, 'list'] as const,
  list: (filters: MoveListFilters = {}) => [...moveKeys.lists(), filters] as const,
  details: () => [...moveKeys.all, 'detail'] as const,
  detail: (id: string) => [...moveKeys.details(), id] as const,
  loadSheet: (id: string) => [...moveKeys.detail(id), 'load-sheet'] as const,
  preview: (body: MovePreviewRequest) => [...moveKeys.all, 'preview', body] as const,
  availability: (nightOf: string, exceptMoveId?: string) =>
    [...moveKeys.all, 'availability', { nightOf, exceptMoveId }] as const,
};

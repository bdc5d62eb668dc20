import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { BlockPlacement } from '@shared/schemas/portal';
import { portalKeys } from './keys';

/** Colonies on each of the grower's blocks today and the strength checks recorded there. */
export const getPlacements = () => api.get<{ items: BlockPlacement[] }>('/api/portal/placements');

export const getPlacementsQueryOptions = () =>
  queryOptions({ queryKey: portalKeys.placements(), queryFn: getPlacements });

export const usePlacements = () => useQuery(getPlacementsQueryOptions());

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { atlasKeys } from './keys';
import type { SiteBoundaryResult } from './types';

export interface MoveDropInput {
  siteId: string;
  version: number;
  drop: number;
  latitude: number;
  longitude: number;
}

/** PATCH /api/sites/:id/drops: moves one drop point inside the boundary. */
export const moveDrop = ({ siteId, ...body }: MoveDropInput) =>
  api.patch<SiteBoundaryResult>(`/api/sites/${siteId}/drops`, body);

export function useMoveDrop() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: moveDrop,
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: atlasKeys.all }),
        queryClient.invalidateQueries({ queryKey: ['sites'] }),
      ]),
  });
}

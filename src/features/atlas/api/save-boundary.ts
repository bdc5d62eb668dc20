import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Polygon } from 'geojson';
import { api } from '@/lib/api-client';
import { atlasKeys } from './keys';
import type { SiteBoundaryResult } from './types';

export interface SaveBoundaryInput {
  siteId: string;
  version: number;
  /** GeoJSON text: a drawn polygon, or an uploaded file (KML already turned into GeoJSON). */
  text: string;
  palletsPerDrop?: number;
}

/** POST /api/sites/:id/boundary: saves the boundary and redoes acreage, colonies and drops. */
export const saveBoundary = ({ siteId, ...body }: SaveBoundaryInput) =>
  api.post<SiteBoundaryResult>(`/api/sites/${siteId}/boundary`, { format: 'geojson', ...body });

/** GeoJSON text of a polygon drawn on the map. */
export const polygonText = (polygon: Polygon) => JSON.stringify(polygon);

export function useSaveBoundary() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveBoundary,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: atlasKeys.all }),
        queryClient.invalidateQueries({ queryKey: ['sites'] }),
      ]),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SiteCreateRequest } from '@shared/schemas/sites';
import { api } from '@/lib/api-client';
import type { Site } from '../types';
import { siteKeys } from './keys';

export interface UpdateSiteInput {
  id: string;
  version: number;
  changes: Partial<SiteCreateRequest>;
}

export const updateSite = ({ id, version, changes }: UpdateSiteInput) =>
  api.patch<Site>(`/api/sites/${encodeURIComponent(id)}`, { ...changes, version });

export function useUpdateSite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSite,
    onSuccess: (site) => {
      queryClient.setQueryData(siteKeys.detail(site.id), site);
      return queryClient.invalidateQueries({ queryKey: siteKeys.lists() });
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SiteCreateRequest } from '@shared/schemas/sites';
import { api } from '@/lib/api-client';
import type { Site } from '../types';
import { siteKeys } from './keys';

export const createSite = (input: SiteCreateRequest) => api.post<Site>('/api/sites', input);

export function useCreateSite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSite,
    onSuccess: (site) => {
      queryClient.setQueryData(siteKeys.detail(site.id), site);
      return queryClient.invalidateQueries({ queryKey: siteKeys.lists() });
    },
  });
}

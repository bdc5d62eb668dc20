import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Site } from '../types';
import { siteKeys } from './keys';

export const archiveSite = ({ id, version }: { id: string; version: number }) =>
  api.post<Site>(`/api/sites/${encodeURIComponent(id)}/archive`, { version });

export function useArchiveSite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: archiveSite,
    onSettled: () => queryClient.invalidateQueries({ queryKey: siteKeys.all }),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { DocumentView } from '../types';
import { documentKeys } from './keys';

export const archiveDocument = ({ id, version }: { id: string; version: number }) =>
  api.post<DocumentView>(`/api/documents/${encodeURIComponent(id)}/archive`, { version });

export function useArchiveDocument() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: archiveDocument,
    onSettled: () => queryClient.invalidateQueries({ queryKey: documentKeys.all }),
  });
}

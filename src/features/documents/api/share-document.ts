import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { DocumentView } from '../types';
import { documentKeys } from './keys';

export interface ShareDocumentInput {
  id: string;
  version: number;
  sharedWithGrower: boolean;
}

export const shareDocument = ({ id, ...body }: ShareDocumentInput) =>
  api.post<DocumentView>(`/api/documents/${encodeURIComponent(id)}/share`, body);

export function useShareDocument() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: shareDocument,
    onSettled: () => queryClient.invalidateQueries({ queryKey: documentKeys.all }),
  });
}

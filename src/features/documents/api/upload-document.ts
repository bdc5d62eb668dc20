import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DocumentAttachment, DocumentKind } from '@shared/schemas/documents';
import { api } from '@/lib/api-client';
import type { DocumentView } from '../types';
import { documentKeys } from './keys';

export interface UploadDocumentInput {
  file: File;
  kind: DocumentKind;
  attachedKind: DocumentAttachment;
  attachedId: string;
  sharedWithGrower: boolean;
}

/** POST /api/documents as multipart: the text fields first, the file last. */
export function uploadDocument(input: UploadDocumentInput) {
  const form = new FormData();
  form.append('kind', input.kind);
  form.append('attachedKind', input.attachedKind);
  form.append('attachedId', input.attachedId);
  form.append('sharedWithGrower', String(input.sharedWithGrower));
  form.append('file', input.file, input.file.name);
  return api.postForm<DocumentView>('/api/documents', form);
}

export function useUploadDocument() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadDocument,
    onSettled: () => queryClient.invalidateQueries({ queryKey: documentKeys.all }),
  });
}

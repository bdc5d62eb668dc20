import { queryOptions } from '@tanstack/react-query';
import type { DocumentAttachment } from '@shared/schemas/documents';
import type { ListResult } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import type { DocumentView } from '../types';
import { documentKeys } from './keys';

export interface DocumentsOf {
  attachedKind: DocumentAttachment;
  attachedId: string;
}

/** The current (unarchived) documents attached to one record. */
export const getDocuments = ({ attachedKind, attachedId }: DocumentsOf) =>
  api.get<ListResult<DocumentView>>('/api/documents', { query: { attachedKind, attachedId } });

export const getDocumentsQueryOptions = (attached: DocumentsOf) =>
  queryOptions({
    queryKey: documentKeys.list(attached),
    queryFn: () => getDocuments(attached),
  });

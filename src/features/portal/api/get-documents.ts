import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { SharedDocument } from '../types';
import { portalKeys } from './keys';

/** Documents shared with the grower on their contracts and sites. */
export const getSharedDocuments = () =>
  api.get<{ items: SharedDocument[]; total: number }>('/api/documents', { query: { limit: 200 } });

export const getSharedDocumentsQueryOptions = () =>
  queryOptions({ queryKey: portalKeys.documents(), queryFn: getSharedDocuments });

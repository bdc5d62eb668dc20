import type { DocumentAttachment } from '@shared/schemas/documents';

/** Query keys of documents: ['documents','list',{ attachedKind, attachedId }]. */
export const documentKeys = {
  all: ['documents'] as const,
  lists: () => [...documentKeys.all, 'list'] as const,
  list: (attached: { attachedKind: DocumentAttachment; attachedId: string }) =>
    [...documentKeys.lists(), attached] as const,
};

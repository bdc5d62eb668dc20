import type { DocumentAttachment, DocumentKind } from '@shared/schemas/documents';

/** A document as GET /api/documents answers it to staff (presentDocument on the server). */
export interface DocumentView {
  id: string;
  kind: DocumentKind;
  name: string;
  contentType: string;
  sizeBytes: number;
  attachedKind: DocumentAttachment;
  attachedId: string;
  /** Absent for growers, who only ever see shared documents. */
  sharedWithGrower?: boolean;
  downloadUrl: string;
  version: number;
  archivedAt: string | null;
  createdAt: string;
}

/** What each kind is called on screen. */
export const documentKindLabels: Record<DocumentKind, string> = {
  contract: 'Contract',
  'inspection-certificate': 'Inspection certificate',
  photo: 'Photo',
  boundary: 'Boundary',
  other: 'Other',
};

/** Only contract and site documents can be shared with the grower (the server refuses others). */
export const shareableAttachments: readonly DocumentAttachment[] = ['contract', 'site'];

/** A byte count as "820 B", "14 KB", "2.3 MB" or "10 MB". */
export function formatFileSize(sizeBytes: number) {
  if (sizeBytes < 1024) return `${sizeBytes} B`;
  if (sizeBytes < 1024 * 1024) return `${Math.round(sizeBytes / 1024)} KB`;
  return `${Number((sizeBytes / (1024 * 1024)).toFixed(1))} MB`;
}

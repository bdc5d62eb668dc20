import { EmptyState } from '@/components/ui/empty-state';
import { formatDateTime } from '@/lib/units';
import type { SharedDocument } from '../types';
import { documentKindLabels } from '../types';

const sizeText = (bytes: number) =>
  bytes < 1024 * 1024
    ? `${Math.max(1, Math.round(bytes / 1024))} KB`
    : `${(bytes / 1048576).toFixed(1)} MB`;

/** Files the beekeeper shared with the grower, each a download link. */
export function SharedDocuments({
  documents,
  attachedTo,
}: {
  documents: SharedDocument[];
  /** A name for what a document is attached to ("Almonds 2027", "Block 12"). */
  attachedTo: (document: SharedDocument) => string;
}) {
  if (documents.length === 0)
    return (
      <EmptyState title="No documents shared yet">
        Contracts, inspection certificates and photos the beekeeper shares with you appear here.
      </EmptyState>
    );
  return (
    <ul className="flex flex-col divide-y divide-dusk-700" aria-label="Shared documents">
      {documents.map((document) => (
        <li key={document.id} className="flex flex-wrap items-baseline justify-between gap-2 py-2">
          <span>
            <a href={document.downloadUrl} download className="font-medium">
              {document.name}
            </a>
            <span className="block text-sm text-dusk-300">
              {documentKindLabels[document.kind] ?? 'Document'} · {attachedTo(document)} ·{' '}
              {sizeText(document.sizeBytes)}
            </span>
          </span>
          <span className="text-sm text-dusk-400">{formatDateTime(document.createdAt)}</span>
        </li>
      ))}
    </ul>
  );
}

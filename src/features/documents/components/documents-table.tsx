import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { formatDate } from '@/lib/units';
import {
  documentKindLabels,
  formatFileSize,
  shareableAttachments,
  type DocumentView,
} from '../types';

interface DocumentsTableProps {
  documents: DocumentView[];
  /** Owners and planners share and archive; everyone else only reads and downloads. */
  canManage: boolean;
  sharingId: string | null;
  onToggleShare: (document: DocumentView) => void;
  onArchive: (document: DocumentView) => void;
}

/** The documents of one record: name, kind, size, date, whether the grower sees it. */
export function DocumentsTable({
  documents,
  canManage,
  sharingId,
  onToggleShare,
  onArchive,
}: DocumentsTableProps) {
  return (
    <div className="overflow-x-auto">
      <table aria-label="Documents" className="w-full text-left text-sm">
        <thead className="text-dusk-300">
          <tr>
            <th className="py-2 pr-3 font-medium">Name</th>
            <th className="py-2 pr-3 font-medium">Kind</th>
            <th className="py-2 pr-3 text-right font-medium">Size</th>
            <th className="py-2 pr-3 font-medium">Added</th>
            {canManage && <th className="py-2 font-medium">Actions</th>}
          </tr>
        </thead>
        <tbody>
          {documents.map((document) => (
            <tr key={document.id} className="border-t border-dusk-700 align-top">
              <td className="py-2 pr-3">
                <div className="flex flex-wrap items-center gap-2">
                  {/* A plain link: the server answers with an attachment, not a page. */}
                  <a href={`/api/documents/${document.id}/download`} className="break-all">
                    {document.name}
                  </a>
                  {document.sharedWithGrower && <Badge tone="green">Shared</Badge>}
                </div>
              </td>
              <td className="py-2 pr-3">{documentKindLabels[document.kind]}</td>
              <td className="py-2 pr-3 text-right tabular-nums">
                {formatFileSize(document.sizeBytes)}
              </td>
              <td className="py-2 pr-3 whitespace-nowrap">{formatDate(document.createdAt)}</td>
              {canManage && (
                <td className="py-2">
                  <div className="flex flex-wrap gap-2">
                    {shareableAttachments.includes(document.attachedKind) && (
                      <Button
                        size="sm"
                        variant="secondary"
                        aria-label={`${document.sharedWithGrower ? 'Stop sharing' : 'Share'} ${document.name} with the grower`}
                        busy={sharingId === document.id}
                        onClick={() => onToggleShare(document)}
                      >
                        {document.sharedWithGrower ? 'Stop sharing' : 'Share'}
                      </Button>
                    )}
                    <Button
                      size="sm"
                      variant="ghost"
                      aria-label={`Archive ${document.name}`}
                      onClick={() => onArchive(document)}
                    >
                      Archive
                    </Button>
                  </div>
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

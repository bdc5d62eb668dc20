import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { DocumentAttachment } from '@shared/schemas/documents';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { FormAlert } from '@/components/ui/form-alert';
import { Section } from '@/components/ui/page-header';
import { TableSkeleton } from '@/components/ui/skeleton';
import { useToast } from '@/components/ui/toast';
import { canPlan, useUser } from '@/lib/auth';
import { useArchiveDocument } from '../api/archive-document';
import { getDocumentsQueryOptions } from '../api/get-documents';
import { useShareDocument } from '../api/share-document';
import type { DocumentView } from '../types';
import { DocumentUploadForm } from './document-upload-form';
import { DocumentsTable } from './documents-table';

interface DocumentsPanelProps {
  attachedKind: DocumentAttachment;
  attachedId: string;
}

/** The "Documents" section of a contract, site, yard or move: list, and for planners upload. */
export function DocumentsPanel({ attachedKind, attachedId }: DocumentsPanelProps) {
  const user = useUser();
  const canManage = canPlan(user);
  const toast = useToast();
  const documents = useQuery(getDocumentsQueryOptions({ attachedKind, attachedId }));
  const share = useShareDocument();
  const archive = useArchiveDocument();
  const [archiving, setArchiving] = useState<DocumentView | null>(null);

  const toggleShare = (document: DocumentView) => {
    const sharedWithGrower = !document.sharedWithGrower;
    share.mutate(
      { id: document.id, version: document.version, sharedWithGrower },
      {
        onSuccess: () =>
          toast.show(
            sharedWithGrower
              ? `${document.name} is shared with the grower.`
              : `${document.name} is no longer shared with the grower.`,
          ),
        onError: (error) => toast.show(`Not changed: ${error.message}`, 'error'),
      },
    );
  };

  const archiveDocument = () => {
    if (!archiving) return;
    archive.mutate(
      { id: archiving.id, version: archiving.version },
      {
        onSuccess: () => {
          toast.show(`${archiving.name} archived.`);
          setArchiving(null);
        },
      },
    );
  };

  return (
    <Section title="Documents">
      {documents.isPending ? (
        <TableSkeleton rows={2} label="Loading documents" />
      ) : documents.isError ? (
        <FormAlert error={documents.error} />
      ) : documents.data.items.length === 0 ? (
        <p className="text-dusk-200">No documents yet.</p>
      ) : (
        <DocumentsTable
          documents={documents.data.items}
          canManage={canManage}
          sharingId={share.isPending ? (share.variables?.id ?? null) : null}
          onToggleShare={toggleShare}
          onArchive={(document) => {
            archive.reset();
            setArchiving(document);
          }}
        />
      )}
      {canManage && (
        <DocumentUploadForm
          attachedKind={attachedKind}
          attachedId={attachedId}
          onUploaded={(name) => toast.show(`Uploaded ${name}.`)}
        />
      )}
      <Dialog
        open={archiving !== null}
        title={`Archive ${archiving?.name ?? 'this document'}?`}
        onClose={() => setArchiving(null)}
      >
        <p className="text-dusk-100">It leaves this list; the stored file is kept.</p>
        <FormAlert error={archive.error} />
        <div className="mt-4 flex gap-2">
          <Button variant="danger" busy={archive.isPending} onClick={archiveDocument}>
            Archive document
          </Button>
          <Button variant="ghost" onClick={() => setArchiving(null)}>
            Keep it
          </Button>
        </div>
      </Dialog>
    </Section>
  );
}

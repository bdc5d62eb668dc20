import { useRef, useState, type FormEvent } from 'react';
import {
  documentDefaultMaxBytes,
  documentKinds,
  type DocumentAttachment,
  type DocumentKind,
} from '@shared/schemas/documents';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormAlert } from '@/components/ui/form-alert';
import { Input, Select } from '@/components/ui/input';
import { ApiError } from '@/lib/api-client';
import { useUploadDocument } from '../api/upload-document';
import { documentKindLabels, formatFileSize, shareableAttachments } from '../types';

/** The kind a new document most likely is, given what it is attached to. */
const likelyKind: Record<DocumentAttachment, DocumentKind> = {
  contract: 'contract',
  site: 'boundary',
  yard: 'photo',
  move: 'other',
};

/** Our wording for the refusals the user can act on: too big, or not a type we keep. */
function refusalOf(error: unknown): string | null {
  if (!(error instanceof ApiError)) return null;
  if (error.status === 413) return `Too large (limit ${formatFileSize(documentDefaultMaxBytes)})`;
  if (error.status === 415)
    return "This kind of file isn't accepted: PDF, PNG, JPEG, GeoJSON or KML";
  return null;
}

interface DocumentUploadFormProps {
  attachedKind: DocumentAttachment;
  attachedId: string;
  onUploaded: (name: string) => void;
}

/** Uploads one file to a contract, site, yard or move; the server checks its type by content. */
export function DocumentUploadForm({
  attachedKind,
  attachedId,
  onUploaded,
}: DocumentUploadFormProps) {
  const upload = useUploadDocument();
  const fileInput = useRef<HTMLInputElement>(null);
  const [kind, setKind] = useState<DocumentKind>(likelyKind[attachedKind]);
  const [shared, setShared] = useState(false);
  const [missingFile, setMissingFile] = useState(false);
  const shareable = shareableAttachments.includes(attachedKind);
  const refusal = refusalOf(upload.error);

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const file = fileInput.current?.files?.[0];
    if (!file) {
      setMissingFile(true);
      return;
    }
    setMissingFile(false);
    upload.mutate(
      { file, kind, attachedKind, attachedId, sharedWithGrower: shareable && shared },
      {
        onSuccess: (document) => {
          if (fileInput.current) fileInput.current.value = '';
          setShared(false);
          onUploaded(document.name);
        },
      },
    );
  };

  return (
    <form
      aria-label="Upload a document"
      onSubmit={submit}
      noValidate
      className="mt-4 flex flex-col gap-3 border-t border-dusk-700 pt-4"
    >
      <h3 className="font-semibold text-dusk-50">Upload a document</h3>
      {refusal ? (
        <Alert title="Not uploaded.">{refusal}</Alert>
      ) : (
        <FormAlert
          error={upload.error}
          unplaced={upload.error instanceof ApiError ? upload.error.fieldIssues : []}
        />
      )}
      <div className="grid gap-3 sm:grid-cols-2">
        <Field
          label="File"
          hint="PDF, PNG, JPEG, GeoJSON or KML, up to 10 MB."
          error={missingFile ? 'Choose a file to upload.' : undefined}
        >
          <Input
            ref={fileInput}
            type="file"
            name="file"
            accept=".pdf,.png,.jpg,.jpeg,.geojson,.json,.kml,application/pdf,image/png,image/jpeg"
            className="py-2"
            onChange={() => {
              setMissingFile(false);
              upload.reset();
            }}
          />
        </Field>
        <Field label="Kind">
          <Select value={kind} onChange={(e) => setKind(e.target.value as DocumentKind)}>
            {documentKinds.map((k) => (
              <option key={k} value={k}>
                {documentKindLabels[k]}
              </option>
            ))}
          </Select>
        </Field>
      </div>
      {shareable && (
        <label className="flex items-center gap-2 text-dusk-100">
          <input
            type="checkbox"
            checked={shared}
            onChange={(e) => setShared(e.target.checked)}
            className="size-5 accent-ember-400"
          />
          Share with the grower
        </label>
      )}
      <div>
        <Button type="submit" busy={upload.isPending}>
          Upload
        </Button>
      </div>
    </form>
  );
}

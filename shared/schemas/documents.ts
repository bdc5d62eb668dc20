import { z } from 'zod';
import { id, includeArchived, pagination, version } from './common';

export const documentKinds = [
  'contract',
  'inspection-certificate',
  'photo',
  'boundary',
  'other',
] as const;
export type DocumentKind = (typeof documentKinds)[number];

/** What a document can be attached to. */
export const documentAttachments = ['contract', 'site', 'yard', 'move'] as const;
export type DocumentAttachment = (typeof documentAttachments)[number];

/** Content types accepted, recognised by their bytes (never by name or declared type). */
export const documentContentTypes = {
  'application/pdf': '.pdf',
  'image/png': '.png',
  'image/jpeg': '.jpg',
  'application/geo+json': '.geojson',
  'application/json': '.json',
  'application/vnd.google-earth.kml+xml': '.kml',
} as const;
export type DocumentContentType = keyof typeof documentContentTypes;

/** Default upload cap (the server's DOCUMENTS_MAX_BYTES may differ). */
export const documentDefaultMaxBytes = 10 * 1024 * 1024;

/** The text fields of POST /api/documents (multipart: every value arrives as a string). */
export const documentUploadFields = z.strictObject({
  kind: z.enum(documentKinds),
  attachedKind: z.enum(documentAttachments),
  attachedId: id,
  sharedWithGrower: z
    .enum(['true', 'false'], { message: 'Send true or false.' })
    .default('false')
    .transform((v) => v === 'true'),
});

export const documentListQuery = z.strictObject({
  ...pagination,
  attachedKind: z.enum(documentAttachments).optional(),
  attachedId: id.optional(),
  kind: z.enum(documentKinds).optional(),
  archived: includeArchived,
});

export const documentShareRequest = z.strictObject({ version, sharedWithGrower: z.boolean() });

export type DocumentUploadFields = z.infer<typeof documentUploadFields>;

import { createHash } from 'node:crypto';
import type { DataSource, SelectQueryBuilder } from 'typeorm';
import type { z } from 'zod';
import { TenantRepository } from '../../db/tenant-repository';
import { AppError } from '../../errors/app-error';
import { isoOrNull } from '../../http/present';
import type { Actor } from '../../middleware/authorise';
import type { DocumentUploadFields, documentListQuery } from '../../../shared/schemas/documents';
import { detectDocumentType, geoJsonSize } from './content-type';
import { sanitiseDisplayName } from './display-name';
import { Document } from './document.entity';
import type { DocumentStore } from './document-store';

export const documents = new TenantRepository(Document, 'Document');

const attachmentTables = { contract: 'contracts', site: 'sites', yard: 'yards', move: 'moves' };
const maxFeatures = 10_000;
const maxVertices = 500_000;

/** A document as each role sees it (growers do not see who uploaded it or sharing flags). */
export function presentDocument(d: Document, actor: Actor) {
  return {
    id: d.id,
    kind: d.kind,
    name: d.originalName,
    contentType: d.contentType,
    sizeBytes: d.sizeBytes,
    attachedKind: d.attachedKind,
    attachedId: d.attachedId,
    ...(actor.role === 'grower'
      ? {}
      : { sharedWithGrower: d.sharedWithGrower, uploadedBy: d.uploadedBy, sha256: d.sha256 }),
    downloadUrl: `/api/documents/${d.id}/download`,
    version: d.version,
    archivedAt: isoOrNull(d.archivedAt),
    createdAt: d.createdAt.toISOString(),
  };
}

/**
 * Who sees which documents: owners and planners all of the operation's; crew those attached to
 * yards, moves and sites (not contracts); a grower only those shared with them and attached to
 * their own contract or site.
 */
function restrictToActor(qb: SelectQueryBuilder<Document>, actor: Actor) {
  if (actor.role === 'crew') qb.andWhere(`record.attachedKind IN ('yard', 'move', 'site')`);
  if (actor.role === 'grower')
    qb.andWhere(
      `record.sharedWithGrower = true AND (
         (record.attachedKind = 'contract' AND record.attachedId IN
           (SELECT c.id FROM contracts c WHERE c.operation_id = :operationId AND c.grower_id = :own))
         OR (record.attachedKind = 'site' AND record.attachedId IN
           (SELECT s.id FROM sites s WHERE s.operation_id = :operationId AND s.grower_id = :own)))`,
      { own: actor.growerId },
    );
}

export interface UploadedFile {
  originalname: string;
  buffer: Buffer;
  size: number;
}

/** Uploaded documents: stored on disk by generated name, described and shared in the database. */
export class DocumentsService {
  constructor(
    private readonly db: DataSource,
    private readonly store: DocumentStore,
  ) {}

  private async visible(actor: Actor, id: string) {
    const qb = documents.query(this.db, actor.operationId).andWhere('record.id = :id', { id });
    restrictToActor(qb, actor);
    const found = await qb.getOne();
    if (!found) throw AppError.notFound('Document');
    return found;
  }

  async list(actor: Actor, query: z.infer<typeof documentListQuery>) {
    const page = await documents.list(
      this.db,
      actor.operationId,
      { ...query, sort: 'createdAt', order: 'desc' },
      (qb) => {
        restrictToActor(qb, actor);
        if (query.attachedKind)
          qb.andWhere('record.attachedKind = :attachedKind', { attachedKind: query.attachedKind });
        if (query.attachedId)
          qb.andWhere('record.attachedId = :attachedId', { attachedId: query.attachedId });
        if (query.kind) qb.andWhere('record.kind = :kind', { kind: query.kind });
      },
    );
    return { items: page.items.map((d) => presentDocument(d, actor)), total: page.total };
  }

  async get(actor: Actor, id: string) {
    return presentDocument(await this.visible(actor, id), actor);
  }

  /** The stored file's path and how to send it, for a caller allowed to see it. */
  async download(actor: Actor, id: string) {
    const document = await this.visible(actor, id);
    return {
      path: this.store.pathOf(document.storedName),
      name: document.originalName,
      contentType: document.contentType,
    };
  }

  /** Checks the content, stores the file under a generated name, records it. */
  async upload(actor: Actor, fields: DocumentUploadFields, file: UploadedFile) {
    const type = detectDocumentType(file.buffer);
    if (!type)
      throw new AppError(
        415,
        'unsupported_media_type',
        'This file is not a PDF, PNG, JPEG, GeoJSON, JSON or KML file.',
      );
    if (type.contentType === 'application/geo+json') {
      const size = geoJsonSize(JSON.parse(file.buffer.toString('utf8').trimStart()));
      if (size.features > maxFeatures || size.vertices > maxVertices)
        throw AppError.validation([
          {
            field: 'file',
            message: `At most ${maxFeatures} features and ${maxVertices} vertices.`,
          },
        ]);
    }
    const table = attachmentTables[fields.attachedKind];
    const [target] = await this.db.query(
      `SELECT id FROM ${table} WHERE operation_id = $1 AND id = $2`,
      [actor.operationId, fields.attachedId],
    );
    if (!target) throw AppError.validation([{ field: 'attachedId', message: 'No such record.' }]);
    if (fields.sharedWithGrower && !['contract', 'site'].includes(fields.attachedKind))
      throw AppError.validation([
        {
          field: 'sharedWithGrower',
          message: 'Only documents of a contract or a site can be shared with its grower.',
        },
      ]);

    const storedName = await this.store.save(file.buffer, type.extension);
    try {
      const document = await this.db.transaction((tx) =>
        documents.insert(tx, actor.operationId, {
          kind: fields.kind,
          originalName: sanitiseDisplayName(file.originalname ?? '', type.extension),
          storedName,
          contentType: type.contentType,
          sizeBytes: file.size,
          sha256: createHash('sha256').update(file.buffer).digest('hex'),
          attachedKind: fields.attachedKind,
          attachedId: fields.attachedId,
          sharedWithGrower: fields.sharedWithGrower,
          uploadedBy: actor.id,
        }),
      );
      return presentDocument(document, actor);
    } catch (error) {
      await this.store.remove(storedName);
      throw error;
    }
  }

  async share(actor: Actor, id: string, version: number, sharedWithGrower: boolean) {
    const current = await documents.get(this.db, actor.operationId, id);
    if (sharedWithGrower && !['contract', 'site'].includes(current.attachedKind ?? ''))
      throw AppError.validation([
        {
          field: 'sharedWithGrower',
          message: 'Only documents of a contract or a site can be shared with its grower.',
        },
      ]);
    const document = await this.db.transaction((tx) =>
      documents.update(tx, actor.operationId, id, version, { sharedWithGrower }),
    );
    return presentDocument(document, actor);
  }

  /** Archives the record; the file stays on disk for the record's history. */
  async archive(actor: Actor, id: string, version: number) {
    const document = await this.db.transaction((tx) =>
      documents.archive(tx, actor.operationId, id, version),
    );
    return presentDocument(document, actor);
  }
}

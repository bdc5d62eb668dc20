import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import type { DataSource } from 'typeorm';
import type { Env } from '../../config/env';
import { AppError } from '../../errors/app-error';
import { parseOrThrow } from '../../errors/validate';
import { idParam } from '../../http/params';
import { actorOf, allow, planners, staff } from '../../middleware/authorise';
import { archiveRequest } from '../../../shared/schemas/common';
import {
  documentListQuery,
  documentShareRequest,
  documentUploadFields,
} from '../../../shared/schemas/documents';
import { attachmentDisposition } from './display-name';
import { DocumentStore } from './document-store';
import { DocumentsService } from './documents.service';

/** multer's limit errors as the API's envelope: too big or too many → 413, malformed → 400. */
function uploadError(error: unknown): AppError {
  if (error instanceof multer.MulterError) {
    if (error.code === 'LIMIT_UNEXPECTED_FILE')
      return AppError.validation([
        { field: error.field ?? 'file', message: 'Send one file, in the field "file".' },
      ]);
    return new AppError(
      413,
      'payload_too_large',
      error.code === 'LIMIT_FILE_SIZE'
        ? 'The file is larger than the upload limit.'
        : 'Send one file and only the expected fields.',
    );
  }
  return new AppError(400, 'bad_request', 'The upload could not be read.');
}

/**
 * /api/documents: owners and planners upload, share and archive; everyone with access lists and
 * downloads (see DocumentsService for who sees what).
 */
export function documentsRouter(
  db: DataSource,
  env: Pick<Env, 'DOCUMENTS_DIR' | 'DOCUMENTS_MAX_BYTES'>,
) {
  const service = new DocumentsService(db, new DocumentStore(env.DOCUMENTS_DIR));
  const router = Router();
  const readers = allow(...staff, 'grower');

  const parseUpload = multer({
    storage: multer.memoryStorage(),
    defParamCharset: 'utf8',
    limits: {
      fileSize: env.DOCUMENTS_MAX_BYTES,
      files: 1,
      fields: 4,
      fieldNameSize: 64,
      fieldSize: 256,
      parts: 5,
      headerPairs: 50,
    },
  }).single('file');
  const receiveFile: RequestHandler = (req, res, next) => {
    if (!req.is('multipart/form-data'))
      throw new AppError(
        415,
        'unsupported_media_type',
        'Send the file as multipart/form-data with the file in the field "file".',
      );
    parseUpload(req, res, (error?: unknown) => next(error ? uploadError(error) : undefined));
  };

  router.get('/', readers, async (req, res) => {
    res.json(await service.list(actorOf(req), parseOrThrow(documentListQuery, req.query)));
  });
  router.get('/:id', readers, async (req, res) => {
    res.json(await service.get(actorOf(req), idParam(req)));
  });
  router.get('/:id/download', readers, async (req, res) => {
    const file = await service.download(actorOf(req), idParam(req));
    res.set({
      'Content-Type': file.contentType,
      'Content-Disposition': attachmentDisposition(file.name),
      'X-Content-Type-Options': 'nosniff',
      'Cache-Control': 'private, no-store',
      'Content-Security-Policy': "default-src 'none'; sandbox",
    });
    await new Promise<void>((resolve, reject) =>
      res.sendFile(file.path, { dotfiles: 'allow', lastModified: false }, (error) =>
        error ? reject(AppError.notFound('Document file')) : resolve(),
      ),
    );
  });
  router.post('/', allow(...planners), receiveFile, async (req, res) => {
    const fields = parseOrThrow(documentUploadFields, req.body ?? {});
    if (!req.file)
      throw AppError.validation([
        { field: 'file', message: 'Attach one file in the field "file".' },
      ]);
    res.status(201).json(await service.upload(actorOf(req), fields, req.file));
  });
  router.post('/:id/share', allow(...planners), async (req, res) => {
    const input = parseOrThrow(documentShareRequest, req.body);
    res.json(
      await service.share(actorOf(req), idParam(req), input.version, input.sharedWithGrower),
    );
  });
  router.post('/:id/archive', allow(...planners), async (req, res) => {
    const { version } = parseOrThrow(archiveRequest, req.body);
    res.json(await service.archive(actorOf(req), idParam(req), version));
  });
  return router;
}

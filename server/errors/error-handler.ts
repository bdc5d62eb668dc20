import type { ErrorRequestHandler } from 'express';
import type { ErrorEnvelope } from '../../shared/api/errors';
import { AppError } from './app-error';
import { isDatabaseUnavailable, sqlState } from './database-errors';

/** Maps any thrown error to the envelope; unknown errors hide behind a generic message. */
export function toAppError(error: unknown): AppError {
  if (error instanceof AppError) return error;
  const e = error as { type?: string; status?: number; code?: string };
  if (e?.type === 'entity.parse.failed')
    return new AppError(400, 'bad_request', 'The request body is not valid JSON.');
  if (e?.type === 'entity.too.large')
    return new AppError(413, 'payload_too_large', 'The request body is too large.');
  if (e?.type === 'encoding.unsupported' || e?.type === 'charset.unsupported')
    return new AppError(415, 'unsupported_media_type', 'Send the body as UTF-8 JSON.');
  if (e?.code === 'EBADCSRFTOKEN')
    return new AppError(403, 'csrf_invalid', 'Your page is out of date. Reload it and try again.');
  if (isDatabaseUnavailable(error))
    return new AppError(
      503,
      'service_unavailable',
      'The database is not reachable right now. Try again shortly.',
      {},
      { 'Retry-After': '5' },
    );
  switch (sqlState(error)) {
    case '57014': // statement timeout
      return new AppError(
        503,
        'service_unavailable',
        'The request took too long. Try again shortly.',
        {},
        { 'Retry-After': '5' },
      );
    case '40001': // serialization failure
    case '40P01': // deadlock
      return new AppError(
        409,
        'conflict',
        'Someone else changed these records at the same moment. Try again.',
      );
    case '23505':
      return new AppError(409, 'conflict', 'A record with these details already exists.');
    case '23503':
      return new AppError(400, 'validation_failed', 'A referenced record does not exist.');
    case '22P02':
    case '22007':
    case '22008':
    case '22003':
      return new AppError(400, 'validation_failed', 'A value is not in the expected form.');
  }
  return new AppError(500, 'internal', 'Something went wrong on our side. It has been logged.');
}

export function errorHandler(log: (error: unknown) => void = console.error): ErrorRequestHandler {
  return (error, _req, res, next) => {
    if (res.headersSent) return next(error);
    const appError = toAppError(error);
    if (appError.status >= 500 && appError.status !== 503) log(error);
    const body: ErrorEnvelope = {
      error: { code: appError.code, message: appError.message, details: appError.details },
    };
    res.status(appError.status).set(appError.headers).json(body);
  };
}

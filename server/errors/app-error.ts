import type { ErrorCode, FieldIssue } from '../../shared/api/errors';

/** An error the API reports to the caller as-is: status, stable code, message, details. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly details: FieldIssue[] | Record<string, unknown> = [],
    readonly headers: Record<string, string> = {},
  ) {
    super(message);
    this.name = 'AppError';
  }

  static notFound(what = 'Record') {
    return new AppError(404, 'not_found', `${what} not found.`);
  }
  static forbidden(message = 'You do not have access to this.') {
    return new AppError(403, 'forbidden', message);
  }
  static unauthenticated() {
    return new AppError(401, 'unauthenticated', 'Sign in first.');
  }
  static staleVersion(current?: number) {
    return new AppError(
      409,
      'version_conflict',
      'Someone else changed this record since you opened it. Reload to see their changes.',
      current === undefined ? {} : { currentVersion: current },
    );
  }
  static validation(details: FieldIssue[], message?: string) {
    const names = details.map((d) => d.field).filter(Boolean);
    return new AppError(
      400,
      'validation_failed',
      message ??
        (names.length
          ? `Check these fields: ${[...new Set(names)].join(', ')}.`
          : 'The request is not valid.'),
      details,
    );
  }
}

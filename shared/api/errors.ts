/** Stable error codes of the API's one error envelope. */
export const errorCodes = [
  'bad_request',
  'validation_failed',
  'unauthenticated',
  'forbidden',
  'not_found',
  'conflict',
  'version_conflict',
  'gone',
  'payload_too_large',
  'unsupported_media_type',
  'too_many_requests',
  'csrf_invalid',
  'service_unavailable',
  'internal',
] as const;

export type ErrorCode = (typeof errorCodes)[number];

/** One problem with one field of a request. */
export interface FieldIssue {
  field: string;
  message: string;
}

/** Every error leaves the API in this shape. */
export interface ErrorEnvelope {
  error: { code: ErrorCode; message: string; details: FieldIssue[] | Record<string, unknown> };
}

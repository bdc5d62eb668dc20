import type { z } from 'zod';
import type { FieldIssue } from '../../shared/api/errors';
import { AppError } from './app-error';

/** Turns zod issues into the envelope's field list, naming each field by its path. */
export function fieldIssues(error: z.ZodError): FieldIssue[] {
  return error.issues.flatMap((issue) => {
    const path = issue.path.map(String);
    // Unknown keys are reported by zod at their parent; name each key itself.
    if (issue.code === 'unrecognized_keys') {
      return issue.keys.map((key) => ({
        field: [...path, key].join('.'),
        message: 'Not accepted here.',
      }));
    }
    return [{ field: path.join('.') || '(body)', message: issue.message }];
  });
}

/** Parses input with a schema or throws a 400 naming every bad field. */
export function parseOrThrow<S extends z.ZodType>(schema: S, input: unknown): z.infer<S> {
  const result = schema.safeParse(input);
  if (!result.success) throw AppError.validation(fieldIssues(result.error));
  return result.data;
}

import { zodResolver } from '@hookform/resolvers/zod';
import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import type { FieldIssue } from '@shared/api/errors';
import { ApiError } from './api-client';

interface IssueLike {
  code: string;
  input?: unknown;
  expected?: unknown;
}

/**
 * Plain words for the generic issues the shared schemas leave to zod (a missing or non-numeric
 * value). Messages written in the schemas themselves take precedence over these.
 */
export function friendlyIssue(issue: IssueLike): string | undefined {
  if (issue.code === 'invalid_type') {
    if (issue.input === undefined || issue.input === null || issue.input === '') return 'Required.';
    if (issue.expected === 'number') return 'Enter a number.';
    if (issue.expected === 'object') return 'Not in the expected form.';
  }
  if (issue.code === 'invalid_value') return 'Choose one of the options.';
  if (issue.code === 'invalid_format') return 'Not in the expected form.';
  return undefined;
}

/** The zod resolver for a shared schema, with our wording for generic issues. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export const schemaResolver: typeof zodResolver = ((schema: any) =>
  zodResolver(schema, { error: (issue: IssueLike) => friendlyIssue(issue) })) as never;

/** Registers a number input: empty stays empty (undefined), text becomes a number. */
export const asNumber = {
  setValueAs: (value: unknown) =>
    value === '' || value === null || value === undefined ? undefined : Number(value),
};
/** Registers an optional date input: empty becomes null. */
export const asNullableDate = { setValueAs: (value: unknown) => (value ? value : null) };

/**
 * Puts a 400's field problems on the form's fields; returns the problems no field shows
 * (paths the form does not hold) so the caller can show them above the form.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: readonly string[],
): FieldIssue[] {
  if (!(error instanceof ApiError) || error.code !== 'validation_failed') return [];
  const unplaced: FieldIssue[] = [];
  for (const issue of error.fieldIssues) {
    const root = issue.field.split('.')[0];
    if (fieldNames.includes(root)) {
      setError(
        issue.field as Path<T>,
        { type: 'server', message: issue.message },
        { shouldFocus: true },
      );
    } else {
      unplaced.push(issue);
    }
  }
  return unplaced;
}

import type { FieldIssue } from '@shared/api/errors';
import { ApiError } from '@/lib/api-client';
import { Alert } from './alert';
import { Button } from './button';

interface FormAlertProps {
  error: unknown;
  /** Problems the server named that no field of the form shows. */
  unplaced?: FieldIssue[];
  /** Loads the record as it is now; the user's typing stays in the form. */
  onReload?: () => void;
  reloading?: boolean;
}

/** Explains why a save failed, above the form; nothing the user typed is cleared. */
export function FormAlert({ error, unplaced = [], onReload, reloading }: FormAlertProps) {
  if (!error) return null;
  if (error instanceof ApiError && error.code === 'version_conflict') {
    return (
      <Alert tone="warning" title="Someone else saved this record while you were editing.">
        <p>
          Your changes are still in the form and have not been saved. Reload the latest version to
          see what changed; what you typed stays put, and you can save again.
        </p>
        {onReload && (
          <Button
            className="mt-2"
            size="sm"
            variant="secondary"
            onClick={onReload}
            busy={reloading}
          >
            Reload latest version
          </Button>
        )}
      </Alert>
    );
  }
  if (error instanceof ApiError && error.code === 'validation_failed') {
    return (
      <Alert title="Some fields need another look.">
        {unplaced.length > 0 && (
          <ul className="list-disc pl-5">
            {unplaced.map((issue) => (
              <li key={issue.field + issue.message}>
                {issue.field && issue.field !== '(body)' ? `${issue.field}: ` : ''}
                {issue.message}
              </li>
            ))}
          </ul>
        )}
      </Alert>
    );
  }
  if (error instanceof ApiError && error.status === 429) {
    const wait = error.retryAfterSeconds;
    return (
      <Alert title="Too many tries.">
        {wait ? `Wait ${wait} seconds, then try again.` : 'Wait a moment, then try again.'}
      </Alert>
    );
  }
  if (error instanceof ApiError && error.status === 403) {
    return <Alert title="Your role cannot make this change.">{error.message}</Alert>;
  }
  const message = error instanceof Error ? error.message : 'Something went wrong.';
  return <Alert title="Not saved.">{message} Your changes are still in the form.</Alert>;
}

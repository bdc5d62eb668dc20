import { Alert } from '@/components/ui/alert';
import { ApiError, isVersionConflict } from '@/lib/api-client';

/** Why an invoice action was refused, in the server's own words. */
export function InvoiceActionAlert({ error, title }: { error: unknown; title: string }) {
  if (!error) return null;
  if (isVersionConflict(error))
    return (
      <Alert tone="warning" title="This invoice changed since you opened it.">
        Look at it again (it has been reloaded) and try once more if it still applies.
      </Alert>
    );
  const message =
    error instanceof ApiError && error.code === 'validation_failed' && error.fieldIssues.length
      ? error.fieldIssues.map((i) => i.message).join(' ')
      : error instanceof Error
        ? error.message
        : 'Something went wrong.';
  return <Alert title={title}>{message}</Alert>;
}
